// The review queue (issue 11, item 2): flagged interviews first, filtered; decisions on one or
// many interviews with a reason, each kept in an append-only audit trail; a rejected interview
// leaves the cells, the balance and the export at once and comes back when reinstated.
import { randomUUID } from 'node:crypto';
import type { OpenAPIObject } from '@nestjs/swagger';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { buildOpenApiDocument } from '../src/openapi/openapi-document.js';
import { QUALITY_FLAGS } from '../src/quality/quality-flags.js';
import { client, complete, pick, syncProject, type Targets } from './fieldwork-helpers.js';
import { startApp, type Harness, type TestOrg } from './harness.js';
import { conformanceProblems, responseSchema } from './openapi-conformance.js';

type Api = Awaited<ReturnType<typeof client>>;
type Item = { id: string; reviewStatus: string; flags: { code: string; label: string; reason: string; figures: { name: string; value: unknown }[] }[] };

let h: Harness;
let doc: OpenAPIObject;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let base: string;
let interviewer: Api;
let lead: Api;
let supervisor: Api;
const day1: string[] = [];
const day2: string[] = [];

const young = () => pick(targets, { age: '18-34', sex: 'female', region: 'North' });
const at = (day: string, hour: number) => `${day}T${String(hour).padStart(2, '0')}:00:00.000Z`;
const north = async () => ((await lead.get(`${base}/cells`)).body.cells as { label: string; achieved: number }[]).find((c) => c.label === 'region: North')!.achieved;
const balanceN = async () => (await lead.get(`${base}/balance`)).body.n as number;
const exported = async () => (await lead.get(`${base}/interviews/export.csv`)).text;
const queue = async (query = '') => {
  const res = await supervisor.get(`${base}/review${query}`);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  expect(conformanceProblems(doc, responseSchema(doc, 'get', '/api/projects/{projectId}/review', 200), res.body)).toEqual([]);
  return res.body as { items: Item[]; nextCursor: string | null };
};
const decide = (body: object, who: Api = supervisor) => who.post(`${base}/review/decisions`, body);
/** The time on the database's clock: a run of the quality rules after it has the sync before it in view. */
const dbNow = async () => (await h.db.raw<{ rows: [{ now: Date }] }>('SELECT now() AS now')).rows[0].now.getTime();
/**
 * A sync queues a run of the quality rules, which replaces the project's findings and
 * interviewer tests: wait for the run after `since` before writing rows a case reads.
 */
const qualityRunAfter = (since: number) =>
  vi.waitFor(async () => {
    const row = await h.db('projects').where({ id: org.projectId }).first('quality_checked_at');
    if (!(row!.quality_checked_at && row!.quality_checked_at.getTime() > since)) throw new Error('the quality rules have not run since the sync');
  }, { timeout: 60_000, interval: 100 });
const statusOf = async (id: string) => (await h.db('interviews').where({ id }).first('review_status'))!.review_status;

beforeAll(async () => {
  h = await startApp();
  doc = buildOpenApiDocument(h.app);
  ({ org, targets, syncPath, interviewer, lead } = await syncProject(h, 'Review', { fieldStart: '2026-11-16', fieldEnd: '2026-12-06', status: 'fieldwork' }));
  supervisor = await client(h, org, 'supervisor');
  base = `/api/projects/${org.projectId}`;
  const batch = [
    ...[8, 9, 10].map((hour) => complete(young(), 'yes' as never, at('2026-11-20', hour))),
    ...[8, 9].map((hour) => complete(young(), 'no' as never, at('2026-11-21', hour))),
  ];
  const since = await dbNow();
  expect((await interviewer.post(syncPath, { interviews: batch })).body.accepted).toBe(5);
  await qualityRunAfter(since);
  day1.push(...batch.slice(0, 3).map((i) => i.id));
  day2.push(...batch.slice(3).map((i) => i.id));
  // What the quality rules would have found: the last interview of day 1 too short.
  await h.db('interview_findings').insert({ interview_id: day1[2]!, project_id: org.projectId, rule: 'too_short', reason: 'Took 4 min; under a third of the median complete (15 min)', figures: { minutes: 4, medianMinutes: 15 } });
});
afterAll(() => h.close());

describe('the review queue', () => {
  it('is for supervisors, leads and admins: interviewers and clients get 403 on every route', async () => {
    for (const role of ['interviewer', 'client'] as const) {
      const who = await client(h, org, role);
      for (const path of ['/review', '/review/options', '/review/decisions.csv', `/interviews/${day1[0]}/decisions`]) {
        expect((await who.get(`${base}${path}`)).status, `${role} ${path}`).toBe(403);
      }
      expect((await decide({ action: 'reject', reason: 'no', interviewIds: [day1[0]] }, who)).status).toBe(403);
    }
    expect(await statusOf(day1[0]!)).toBe('pending');
  });

  it('lists flagged interviews first with the reason in words and figures, and filters by flag, interviewer, day, cell and status', async () => {
    const all = await queue();
    expect(all.items[0]!.id).toBe(day1[2]);
    expect(all.items[0]!.flags).toEqual([{ code: 'too_short', label: 'Too short', reason: 'Took 4 min; under a third of the median complete (15 min)', figures: [{ name: 'minutes', value: 4 }, { name: 'medianMinutes', value: 15 }] }]);
    // The rest newest first.
    expect(all.items.slice(1).map((i) => i.id)).toEqual([...day2].reverse().concat([day1[1]!, day1[0]!]));
    expect((await queue('?flag=too_short')).items.map((i) => i.id)).toEqual([day1[2]]);
    expect((await queue('?flag=over_quota')).items).toEqual([]);
    expect((await queue('?fieldDay=2026-11-21')).items.map((i) => i.id).sort()).toEqual([...day2].sort());
    expect((await queue(`?interviewerId=${org.users.interviewer.id}`)).items).toHaveLength(5);
    const cells = (await lead.get(`${base}/cells`)).body.cells as { id: string; label: string }[];
    expect((await queue(`?cellId=${cells.find((c) => c.label === 'region: North')!.id}`)).items).toHaveLength(5);
    expect((await queue(`?cellId=${cells.find((c) => c.label === 'region: South')!.id}`)).items).toEqual([]);
    expect((await queue('?status=rejected')).items).toEqual([]);
    expect((await supervisor.get(`${base}/review?flag=made_up`)).status).toBe(400);
    expect((await supervisor.get(`${base}/review?after=nonsense`)).status).toBe(400);
  });

  it('pages through every interview once, flagged ones first', async () => {
    const seen: string[] = [];
    let after = '';
    do {
      const page = await queue(`?limit=2${after ? `&after=${after}` : ''}`);
      seen.push(...page.items.map((i) => i.id));
      after = page.nextCursor ?? '';
    } while (after);
    expect(seen).toEqual((await queue()).items.map((i) => i.id));
  });
});

describe('decisions', () => {
  it('rejecting takes an interview out of the cells, the balance and the export at once; reinstating brings it back', async () => {
    const [cell, n] = [await north(), await balanceN()];
    const res = await decide({ action: 'reject', reason: '  Too short to be real  ', interviewIds: [day1[2]!.toUpperCase()] });
    expect(res.status).toBe(200);
    expect(conformanceProblems(doc, responseSchema(doc, 'post', '/api/projects/{projectId}/review/decisions', 200), res.body)).toEqual([]);
    expect(res.body).toEqual({ action: 'reject', decided: 1, interviews: [{ id: day1[2], previousStatus: 'pending', newStatus: 'rejected' }] });
    expect([await north(), await balanceN()]).toEqual([cell - 1, n - 1]);
    expect(await exported()).not.toContain(day1[2]);
    // A rejected interview keeps showing its flags.
    expect((await queue('?status=rejected')).items.map((i) => [i.id, i.flags.length])).toEqual([[day1[2], 1]]);

    expect((await decide({ action: 'reinstate', reason: 'Timing explained by the interviewer', interviewIds: [day1[2]] })).status).toBe(200);
    expect([await north(), await balanceN()]).toEqual([cell, n]);
    expect(await exported()).toContain(day1[2]);
  });

  it('an approved interview shows no flags and sorts with the unflagged', async () => {
    expect((await decide({ action: 'approve', reason: 'Checked', interviewIds: [day1[2]] })).status).toBe(200);
    const page = await queue();
    expect(page.items.map((i) => i.id)).toEqual([...day2].reverse().concat([day1[2]!, day1[1]!, day1[0]!]));
    expect(page.items.find((i) => i.id === day1[2])).toMatchObject({ reviewStatus: 'approved', flags: [] });
    expect((await queue('?flag=too_short')).items).toEqual([]);
  });

  it('keeps each step in the trail with the state before it, who and why', async () => {
    const res = await supervisor.get(`${base}/interviews/${day1[2]}/decisions`);
    expect(res.status).toBe(200);
    expect(conformanceProblems(doc, responseSchema(doc, 'get', '/api/projects/{projectId}/interviews/{interviewId}/decisions', 200), res.body)).toEqual([]);
    expect(res.body.map((d: { action: string; previousStatus: string; newStatus: string; reason: string; decidedBy: { id: string } }) =>
      [d.action, d.previousStatus, d.newStatus, d.reason, d.decidedBy.id])).toEqual([
      ['reject', 'pending', 'rejected', 'Too short to be real', org.users.supervisor.id],
      ['reinstate', 'rejected', 'pending', 'Timing explained by the interviewer', org.users.supervisor.id],
      ['approve', 'pending', 'approved', 'Checked', org.users.supervisor.id],
    ]);
    expect((await supervisor.get(`${base}/interviews/${org.projectId}/decisions`)).status).toBe(404);
  });

  it('rejects all of one interviewer on one day at once, and reinstates them', async () => {
    const cell = await north();
    const selection = { interviewerId: org.users.interviewer.id, fieldDay: '2026-11-21' };
    const res = await decide({ action: 'reject', reason: 'Day not worked as reported', selection }, lead);
    expect(res.body).toMatchObject({ decided: 2 });
    expect(await north()).toBe(cell - 2);
    expect(await Promise.all(day2.map(statusOf))).toEqual(['rejected', 'rejected']);
    expect((await decide({ action: 'reinstate', reason: 'Confirmed by phone', selection })).body).toMatchObject({ decided: 2 });
    expect(await north()).toBe(cell);
  });

  it('refuses bad decisions with a clear reason and changes nothing', async () => {
    const before = await h.db('review_decisions').where({ project_id: org.projectId }).count<{ count: string }[]>('* as count');
    const cases: [object, number, RegExp][] = [
      [{ action: 'reject', reason: '   ', interviewIds: [day1[0]] }, 400, /reason must not be empty/],
      [{ action: 'reject', interviewIds: [day1[0]] }, 400, /reason/],
      [{ action: 'remove', reason: 'x', interviewIds: [day1[0]] }, 400, /action must be approve, reject or reinstate/],
      [{ action: 'reject', reason: 'x' }, 400, /either interviewIds or selection/],
      [{ action: 'reject', reason: 'x', interviewIds: [day1[0]], selection: { interviewerId: org.users.interviewer.id, fieldDay: '2026-11-20' } }, 400, /not both/],
      [{ action: 'reject', reason: 'x', interviewIds: [] }, 400, /at least 1/],
      [{ action: 'reject', reason: 'x', interviewIds: [day1[0], org.projectId] }, 400, /Not interviews of this project/],
      [{ action: 'reinstate', reason: 'x', interviewIds: [day1[0], day1[1]] }, 409, /Cannot reinstate 2 of these interviews: they are pending/],
      [{ action: 'approve', reason: 'x', interviewIds: [day1[0], day1[2]] }, 409, /Cannot approve this interview: it is approved/],
      [{ action: 'reinstate', reason: 'x', selection: { interviewerId: org.users.interviewer.id, fieldDay: '2026-11-20' } }, 409, /None of this interviewer's 3 interviews/],
    ];
    for (const [body, status, message] of cases) {
      const res = await decide(body);
      expect([res.status, res.body.message], JSON.stringify(body)).toEqual([status, expect.stringMatching(message)]);
    }
    expect(await statusOf(day1[0]!)).toBe('pending');
    expect(await h.db('review_decisions').where({ project_id: org.projectId }).count<{ count: string }[]>('* as count')).toEqual(before);
  });
});

describe('the audit trail', () => {
  it('cannot be changed through any route', async () => {
    const paths = ['/review/decisions', '/review/decisions/1', `/interviews/${day1[2]}/decisions`, `/interviews/${day1[2]}/decisions/1`, '/review/decisions.csv'];
    for (const path of paths) {
      for (const method of ['put', 'patch', 'delete'] as const) {
        const res = await h.http()[method](`${base}${path}`).set({ Authorization: `Bearer ${lead.token}` }).send({ reason: 'changed' });
        expect([404, 405], `${method} ${path}`).toContain(res.status);
      }
    }
    expect((await h.db('review_decisions').where({ interview_id: day1[2] }).pluck('reason'))).toEqual(['Too short to be real', 'Timing explained by the interviewer', 'Checked']);
  });

  it('cannot be changed by SQL either: the trigger refuses UPDATE and DELETE', async () => {
    await expect(h.db.raw('UPDATE review_decisions SET reason = ? WHERE interview_id = ?', ['rewritten', day1[2]!])).rejects.toThrow(/append-only audit trail: UPDATE is refused/);
    await expect(h.db.raw('DELETE FROM review_decisions WHERE interview_id = ?', [day1[2]!])).rejects.toThrow(/append-only audit trail: DELETE is refused/);
    expect(await h.db('review_decisions').where({ interview_id: day1[2] }).count<{ count: string }[]>('* as count')).toEqual([{ count: '3' }]);
  });

  it('exports as CSV, a reason that looks like a formula neutralised', async () => {
    await decide({ action: 'reject', reason: '=HYPERLINK("http://example.invalid")', interviewIds: [day1[0]] });
    const res = await supervisor.get(`${base}/review/decisions.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    const lines = res.text.trim().split('\n');
    expect(lines[0]).toBe('decided_at,interview_id,interviewer,field_day,action,previous_status,new_status,reason,decided_by');
    expect(lines.slice(1, 4).map((l) => l.split(',').slice(4, 7).join(' '))).toEqual(['reject pending rejected', 'reinstate rejected pending', 'approve pending approved']);
    expect(lines.at(-1)).toContain(`${day1[0]},`);
    expect(lines.at(-1)).toContain('"\'=HYPERLINK(""http://example.invalid"")"');
    await decide({ action: 'reinstate', reason: 'Undo', interviewIds: [day1[0]] });
  });
});

describe('every kind of flag', () => {
  it('shows over quota with its cell, the interviewer\'s answer test with its p-values and a back-check with what differed', async () => {
    const cells = (await lead.get(`${base}/cells`)).body.cells as { id: string; label: string }[];
    const northId = cells.find((c) => c.label === 'region: North')!.id;
    await supervisor.post(`${base}/cells/${northId}/close`);
    const [late, checked] = [complete(young(), 'yes' as never, at('2026-11-23', 9)), complete(young(), 'no' as never, at('2026-11-23', 8))];
    // A refusal the same day: the answer test is about headline answers, so it does not mark it.
    const refused = { id: randomUUID(), disposition: 'refusal', startedAt: at('2026-11-23', 7), endedAt: at('2026-11-23', 7) };
    const since = await dbNow();
    expect((await interviewer.post(syncPath, { interviews: [late, checked, refused] })).body.accepted).toBe(3);
    await supervisor.post(`${base}/cells/${northId}/reopen`);
    await qualityRunAfter(since);
    await h.db('interviewer_tests').insert({ project_id: org.projectId, interviewer_id: org.users.interviewer.id, completes: 40, p_value: 0.0012, adjusted_p_value: 0.03, flagged: true, reason: 'Answers yes more often than the others in the same cells', figures: { completes: 40 } })
      .onConflict(['project_id', 'interviewer_id']).merge();
    await h.db('backchecks').insert({ interview_id: checked.id, project_id: org.projectId, interviewer_id: org.users.interviewer.id, share_at_selection: 0.1, outcome: 'not_confirmed', outcome_note: 'Respondent says nobody called', recorded_by: org.users.supervisor.id, recorded_at: new Date() });

    const byFlag = async (flag: string) => (await queue(`?flag=${flag}&fieldDay=2026-11-23`)).items;
    const [overQuota] = await byFlag('over_quota');
    expect(overQuota!.flags.find((f) => f.code === 'over_quota')).toEqual({ code: 'over_quota', label: 'Over quota', reason: 'Arrived when region: North was full or closed', figures: [{ name: 'cells', value: 1 }] });
    expect((await byFlag('interviewer_answers')).map((i) => i.id)).toEqual([late.id, checked.id]);
    const refusal = (await queue('?fieldDay=2026-11-23')).items.find((i) => i.id === refused.id)!;
    expect(refusal.flags.map((f) => f.code)).not.toContain('interviewer_answers');
    expect(overQuota!.flags.find((f) => f.code === 'interviewer_answers')).toEqual({
      code: 'interviewer_answers', label: QUALITY_FLAGS.interviewer_answers.label, reason: 'Answers yes more often than the others in the same cells',
      figures: [{ name: 'pValue', value: 0.0012 }, { name: 'adjustedPValue', value: 0.03 }, { name: 'completes', value: 40 }],
    });
    const [backchecked] = await byFlag('backcheck_not_confirmed');
    expect(backchecked!.id).toBe(checked.id);
    expect(backchecked!.flags.map((f) => [f.code, f.reason])).toContainEqual(['backcheck_not_confirmed', 'Back-check did not confirm it: Respondent says nobody called']);
    await h.db('interviewer_tests').where({ project_id: org.projectId }).delete();
  });
});

describe('decisions and sync together', () => {
  it('a sync batch and a bulk reject of the same project at once both succeed', async () => {
    const cell = await north();
    const batch = [8, 9, 10, 11].map((hour) => complete(young(), 'yes' as never, at('2026-11-22', hour)));
    const selection = { interviewerId: org.users.interviewer.id, fieldDay: '2026-11-20' };
    const [synced, decided] = await Promise.all([interviewer.post(syncPath, { interviews: batch }), decide({ action: 'reject', reason: 'Whole day doubtful', selection })]);
    expect([synced.status, synced.body.accepted, decided.status, decided.body.decided]).toEqual([200, 4, 200, 3]);
    expect(await north()).toBe(cell + 4 - 3);
  });

  it('refuses decisions on an archived project with 409, as other edits', async () => {
    await lead.patch(base, { status: 'closed' });
    expect((await lead.post(`${base}/archive`)).status).toBe(200);
    const res = await decide({ action: 'reinstate', reason: 'x', interviewIds: [day1[0]] });
    expect([res.status, res.body.message]).toEqual([409, expect.stringMatching(/archived/)]);
    expect(await statusOf(day1[0]!)).toBe('rejected');
  });
});
