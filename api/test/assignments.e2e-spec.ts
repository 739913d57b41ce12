// Per-interviewer assignments (issue 10, item 4): a lead or supervisor gives an interviewer
// on the team a target of completes and, optionally, cells; the interviewer reads their own
// progress in their project list (which the device keeps for offline use).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, syncProject, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let lead: Awaited<ReturnType<typeof client>>;
let interviewer: Awaited<ReturnType<typeof client>>;
let path: string;
let cellIds: string[];

const del = (c: { token: string }, url: string) => h.http().delete(url).set({ Authorization: `Bearer ${c.token}` });
const stored = () => h.db('interviewer_assignments').where({ project_id: org.projectId }).select('user_id', 'target', 'cell_ids');

beforeAll(async () => {
  h = await startApp();
  ({ org, lead, targets, syncPath, interviewer } = await syncProject(h, 'Assign', { fieldStart: '2026-11-16', fieldEnd: '2026-12-06', status: 'fieldwork' }));
  path = `/api/projects/${org.projectId}/assignments/${org.users.interviewer.id}`;
  cellIds = (await lead.get(`/api/projects/${org.projectId}/cells`)).body.cells.map((c: { id: string }) => c.id);
});
afterAll(() => h.close());

describe('assignments', () => {
  it('lets the lead set one, lists it with the completes so far, and the interviewer sees it in their project list', async () => {
    const set = await lead.put(path, { target: 40, cellIds: [cellIds[1]!.toUpperCase(), cellIds[0]] });
    expect(set.status).toBe(200);
    // Cells come back in the cells' order, whatever the order and case sent.
    expect(set.body).toMatchObject({ userId: org.users.interviewer.id, target: 40, cellIds: [cellIds[0], cellIds[1]], completes: 0 });

    const someone = pick(targets, { age: '18-34', sex: 'female', region: 'North' });
    const now = new Date(Date.now() - 30 * 60_000).toISOString();
    await interviewer.post(syncPath, { interviews: [complete(someone, true, now), complete(someone, false, now), { ...complete(someone), disposition: 'refusal', categories: undefined, headlineAnswer: undefined }] });

    const list = await (await client(h, org, 'supervisor')).get(`/api/projects/${org.projectId}/assignments`);
    expect(list.status).toBe(200);
    expect(list.body).toEqual([expect.objectContaining({ userId: org.users.interviewer.id, target: 40, completes: 3 - 1 })]);

    const mine = (await interviewer.get('/api/projects')).body.find((p: { id: string }) => p.id === org.projectId);
    expect(mine.mine).toMatchObject({ completes: 2, todayCompletes: 2, todayContacts: 2, assignment: { target: 40, cellIds: [cellIds[0], cellIds[1]] } });
    // Other roles have no figures of their own.
    expect((await lead.get('/api/projects')).body.find((p: { id: string }) => p.id === org.projectId).mine).toBeNull();
  });

  it('lets a supervisor change and clear it; clearing twice is a 404', async () => {
    const supervisor = await client(h, org, 'supervisor');
    expect((await supervisor.put(path, { target: 25 })).body).toMatchObject({ target: 25, cellIds: [] });
    expect((await del(supervisor, path)).status).toBe(204);
    expect(await stored()).toEqual([]);
    expect((await del(supervisor, path)).status).toBe(404);
    const mine = (await interviewer.get('/api/projects')).body.find((p: { id: string }) => p.id === org.projectId);
    expect(mine.mine.assignment).toBeNull();
  });

  it('refuses bad input with a clear 400 and stores nothing', async () => {
    const cases: [object, RegExp][] = [
      [{}, /target must be a whole number/],
      [{ target: 0 }, /target must be at least 1/],
      [{ target: 2.5 }, /target must be a whole number/],
      [{ target: 10, cellIds: ['not-a-cell'] }, /each of cellIds must be a cell id/],
      [{ target: 10, cellIds: '0b6f' }, /cellIds must be a list/],
      [{ target: 10, cellIds: null }, /cellIds/],
      [{ target: 10, extra: 1 }, /extra/],
    ];
    for (const [body, message] of cases) {
      const res = await lead.put(path, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(JSON.stringify(res.body)).toMatch(message);
    }
    const unknownCell = await lead.put(path, { target: 10, cellIds: ['00000000-0000-4000-8000-000000000000'] });
    expect(unknownCell.status).toBe(400);
    expect(unknownCell.body.message).toMatch(/is not a quota cell of this project/);
    // Not an interviewer (the client is on the team), or not on the team at all.
    for (const userId of [org.users.client.id, org.users.supervisor.id]) {
      const res = await lead.put(`/api/projects/${org.projectId}/assignments/${userId}`, { target: 10 });
      expect(res.status).toBe(400);
      expect(res.body.message).toMatch(/interviewers on this project’s team/);
    }
    expect(await stored()).toEqual([]);
  });

  it('does not let an interviewer or a client set assignments, and answers 404 across organisations', async () => {
    expect((await interviewer.put(path, { target: 5 })).status).toBe(403);
    expect((await interviewer.get(`/api/projects/${org.projectId}/assignments`)).status).toBe(403);
    expect((await (await client(h, org, 'client')).put(path, { target: 5 })).status).toBe(403);
    const other = await createOrg(h.db, 'Elsewhere');
    const otherLead = await client(h, other, 'lead');
    expect((await otherLead.put(path, { target: 5 })).status).toBe(404);
    expect((await otherLead.get(`/api/projects/${org.projectId}/assignments`)).status).toBe(404);
    expect((await del(otherLead, path)).status).toBe(404);
    // Our lead cannot assign someone of another organisation to our project.
    expect((await lead.put(`/api/projects/${org.projectId}/assignments/${other.users.interviewer.id}`, { target: 5 })).status).toBe(400);
    expect(await stored()).toEqual([]);
  });

  it('goes with the person when they leave the team', async () => {
    await lead.put(path, { target: 12 });
    expect(await stored()).toHaveLength(1);
    await lead.put(`/api/projects/${org.projectId}/members`, { userIds: [org.users.client.id] });
    expect(await stored()).toEqual([]);
  });
});
