// Interviews the project did not expect are kept and flagged, not lost (issue 7, part 5):
// accepted with the flag, counted by reason for the supervisor, named in the export.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, syncProject, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let interviewer: Awaited<ReturnType<typeof client>>;
let lead: Awaited<ReturnType<typeof client>>;

const someone = () => pick(targets, { age: '60+', sex: 'male', region: 'South' });
const endingOn = (day: string) => complete(someone(), true, `${day}T10:00:00.000Z`);
const storedFlags = async (id: string) => (await h.db('interviews').where({ id }).first('flags'))!.flags;

beforeAll(async () => {
  h = await startApp();
  ({ org, lead, targets, syncPath, interviewer } = await syncProject(h, 'Flags', { fieldStart: '2026-11-16', fieldEnd: '2026-12-06', status: 'fieldwork' }));
});
afterAll(() => h.close());

describe('interviews the project did not expect', () => {
  it('flags nothing inside the field dates or within a day of them', async () => {
    const batch = ['2026-11-15', '2026-11-20', '2026-12-07'].map(endingOn);
    const res = await interviewer.post(syncPath, { interviews: batch });
    expect(res.body.results.map((r: { status: string; flags: string[] }) => [r.status, r.flags])).toEqual([
      ['accepted', []], ['accepted', []], ['accepted', []],
    ]);
    expect((await (await client(h, org, 'supervisor')).get(`/api/projects/${org.projectId}/interviews/flags`)).body).toEqual({ total: 0, byReason: [], voided: [] });
  });

  it('accepts an interview that ended more than a day outside the field dates, flagged with the reason', async () => {
    const early = endingOn('2026-11-14');
    const late = endingOn('2026-12-08');
    const res = await interviewer.post(syncPath, { interviews: [early, late] });
    expect(res.body).toMatchObject({ accepted: 2, rejected: 0 });
    expect(res.body.results[0]).toEqual({ id: early.id, status: 'accepted', overQuota: false, overQuotaCells: [], flags: ['outside_field_dates'] });
    expect(await storedFlags(late.id)).toEqual(['outside_field_dates']);
  });

  it('accepts interviews sent to a closed project, flagged, and counts them for the supervisor and in the export', async () => {
    await lead.patch(`/api/projects/${org.projectId}`, { status: 'closed' });
    const inside = endingOn('2026-11-21');
    const lateToo = endingOn('2026-12-20');
    const res = await interviewer.post(syncPath, { interviews: [inside, lateToo] });
    expect(res.body.results.map((r: { status: string; flags: string[] }) => [r.status, r.flags])).toEqual([
      ['accepted', ['project_closed']],
      ['accepted', ['project_closed', 'outside_field_dates']],
    ]);

    const supervisor = await client(h, org, 'supervisor');
    const flags = await supervisor.get(`/api/projects/${org.projectId}/interviews/flags`);
    expect(flags.status).toBe(200);
    expect(flags.body).toEqual({
      total: 4,
      byReason: [
        { code: 'project_closed', reason: 'Sent after the project was closed', count: 2 },
        { code: 'outside_field_dates', reason: 'Ended more than a day outside the field dates', count: 3 },
      ],
      voided: [],
    });

    const lines = (await lead.get(`/api/projects/${org.projectId}/interviews/export.csv`)).text.trim().split('\n');
    expect(lines[0]!.split(',').at(-1)).toBe('flags');
    const flagsOf = (id: string) => lines.find((line: string) => line.startsWith(id))!.split(',').at(-1);
    expect(flagsOf(lateToo.id)).toBe('project_closed;outside_field_dates');
    expect(flagsOf(inside.id)).toBe('project_closed');
  });

  it('shows the flag counts to the office only', async () => {
    expect((await interviewer.get(`/api/projects/${org.projectId}/interviews/flags`)).status).toBe(403);
    expect((await (await client(h, org, 'client')).get(`/api/projects/${org.projectId}/interviews/flags`)).status).toBe(403);
    const rival = await createOrg(h.db, 'Rival');
    expect((await (await client(h, rival, 'supervisor')).get(`/api/projects/${org.projectId}/interviews/flags`)).status).toBe(404);
  });
});
