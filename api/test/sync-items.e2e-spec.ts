// One bad item never blocks a batch, and ids are compared as UUIDs (issue 7, parts 3 and 4).
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, syncProject, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let interviewer: Awaited<ReturnType<typeof client>>;

type Result = { id: string | null; status: string; reason?: string };
const rowCount = async (ids: string[]) => Number((await h.db('interviews').whereIn('id', ids).count({ n: '*' }))[0]!.n);
const someone = () => pick(targets, { age: '35-59', sex: 'female', region: 'Coast' });

/** A second interviewer of the same organisation, assigned to the project. */
async function secondInterviewer(o: TestOrg) {
  const first = await h.db('users').where({ id: o.users.interviewer.id }).first();
  const email = `second.${randomUUID().slice(0, 8)}@sync.example`;
  const [row] = await h.db('users')
    .insert({ organisation_id: o.id, email, name: 'Second interviewer', role: 'interviewer', password_hash: first!.password_hash })
    .returning('*');
  await h.db('project_members').insert({ project_id: o.projectId, user_id: row!.id });
  return client(h, { ...o, users: { ...o.users, interviewer: { id: row!.id, email } } }, 'interviewer');
}

beforeAll(async () => {
  h = await startApp();
  ({ org, targets, syncPath, interviewer } = await syncProject(h, 'Sync'));
});
afterAll(() => h.close());

describe('one bad item never blocks a batch', () => {
  it('rejects dates JavaScript or PostgreSQL cannot read, impossible years and placeholder ids, and stores the rest', async () => {
    const good = [complete(someone()), complete(someone())];
    const faults: [Record<string, unknown>, string][] = [
      [{ startedAt: '2026-W47-5' }, 'startedAt must be a date and time such as 2026-11-20T10:02:00Z'],
      [{ endedAt: '2026-324' }, 'endedAt must be a date and time such as 2026-11-20T10:02:00Z'],
      [{ endedAt: '20261120T100000Z' }, 'endedAt must be a date and time such as 2026-11-20T10:02:00Z'],
      [{ startedAt: '2026-11-20T10Z' }, 'startedAt must be a date and time such as 2026-11-20T10:02:00Z'],
      [{ endedAt: '2026-11-20T10:20:00,5Z' }, 'endedAt must be a date and time such as 2026-11-20T10:02:00Z'],
      [{ endedAt: '2026-02-30T10:20:00Z' }, 'endedAt is not a real date and time'],
      [{ startedAt: '0000-01-01T00:00:00Z' }, 'startedAt is in the year 0; check the date on the device'],
      [{ startedAt: '1970-01-01T00:00:00Z' }, 'startedAt is in the year 1970; check the date on the device'],
      [{ endedAt: '9999-12-31T23:59:59Z' }, 'endedAt is in the year 9999; check the date on the device'],
      [{ id: '00000000-0000-0000-0000-000000000000' }, 'id is a placeholder UUID, not one made for this interview'],
      [{ headlineAnswer: null }, 'headlineAnswer is missing'],
      [{ categories: { ...someone(), [targets.variables[0]!.id]: { toString: 1 } } }, 'age: unknown category'],
      [{ categories: { ...someone(), [randomUUID()]: 'x' } }, 'names a quota variable this project does not have'],
      [{ disposition: 'completed' }, 'disposition must be one of complete, partial, refusal, non_contact, other, not_eligible, quota_full'],
    ];
    const bad = faults.map(([change]) => ({ ...complete(someone()), ...change }));
    const res = await interviewer.post(syncPath, { interviews: [good[0], ...bad, good[1]] });
    expect(res.status).toBe(200);
    const results: Result[] = res.body.results;
    expect(results).toHaveLength(faults.length + 2);
    expect(results.map((r) => r.status)).toEqual(['accepted', ...faults.map(() => 'rejected'), 'accepted']);
    expect(results.slice(1, -1).map((r) => r.reason)).toEqual(faults.map(([, reason]) => reason));
    expect(await rowCount(good.map((g) => g.id))).toBe(2);
    expect(await rowCount(bad.slice(0, -1).map((b) => b.id as string).filter((id) => id !== '00000000-0000-0000-0000-000000000000'))).toBe(0);
  });

  it('rejects a complete sent to a project that never had targets, and keeps a refusal sent with it', async () => {
    const bare = await createOrg(h.db, 'Bare');
    const device = await client(h, bare, 'interviewer');
    const refusal = { id: randomUUID(), disposition: 'refusal', startedAt: '2026-11-20T11:00:00Z', endedAt: '2026-11-20T11:01:00Z' };
    const lone = { ...complete({}), categories: undefined };
    const res = await device.post(`/api/projects/${bare.projectId}/interviews/sync`, { interviews: [lone, refusal] });
    expect(res.status).toBe(200);
    expect(res.body.results).toEqual([
      { id: lone.id, status: 'rejected', reason: 'the project has no quota targets yet, so a complete cannot be counted' },
      { id: refusal.id, status: 'accepted', overQuota: false, overQuotaCells: [], flags: [] },
    ]);
    expect(await rowCount([lone.id, refusal.id])).toBe(1);
  });

  it('answers a row the database refuses as that item’s rejection and stores the rest of the batch', async () => {
    // A rule the checks do not know about stands in for any refusal the database might make.
    await h.db.raw(`ALTER TABLE interviews ADD CONSTRAINT test_refuse_one CHECK (started_at <> '2026-11-20T10:07:00Z')`);
    try {
      const batch = [complete(someone()), complete(someone(), true, '2026-11-20T10:07:00Z'), complete(someone())];
      const res = await interviewer.post(syncPath, { interviews: batch });
      expect(res.status).toBe(200);
      expect(res.body.results.map((r: Result) => r.status)).toEqual(['accepted', 'rejected', 'accepted']);
      expect(res.body.results[1].reason).toBe('the server could not store this interview; keep it on the device and tell your supervisor');
      expect(await rowCount([batch[0]!.id, batch[2]!.id])).toBe(2);
      expect(await rowCount([batch[1]!.id])).toBe(0);
    } finally {
      await h.db.raw('ALTER TABLE interviews DROP CONSTRAINT test_refuse_one');
    }
  });
});

describe('ids compared as UUIDs', () => {
  it('answers the same interviewer’s stored interview resent in capitals as duplicate, in lower case, and stores nothing new', async () => {
    const item = complete(someone());
    expect((await interviewer.post(syncPath, { interviews: [item] })).body.accepted).toBe(1);
    const shouted = { ...item, id: item.id.toUpperCase() };
    const res = await interviewer.post(syncPath, { interviews: [shouted] });
    expect(res.body.results).toEqual([{ id: item.id, status: 'duplicate' }]);
    expect(await rowCount([item.id])).toBe(1);
  });

  it('stores an interview first sent in capitals under its lower-case id', async () => {
    const item = { ...complete(someone()), id: randomUUID().toUpperCase() };
    const res = await interviewer.post(syncPath, { interviews: [item] });
    expect(res.body.results[0]).toMatchObject({ id: item.id.toLowerCase(), status: 'accepted' });
    expect((await h.db('interviews').where({ id: item.id.toLowerCase() }).first('interviewer_id'))!.interviewer_id).toBe(org.users.interviewer.id);
  });

  it('rejects an id another interviewer holds, in capitals or not, so that device keeps its interview', async () => {
    const item = complete(someone());
    await interviewer.post(syncPath, { interviews: [item] });
    const other = await secondInterviewer(org);
    for (const id of [item.id.toUpperCase(), item.id]) {
      const res = await other.post(syncPath, { interviews: [{ ...complete(someone()), id }] });
      expect(res.body.results).toEqual([
        { id: item.id, status: 'rejected', reason: 'another interview already has this id; keep it on the device and tell your supervisor' },
      ]);
    }
    expect(await h.db('interviews').where({ id: item.id }).select('interviewer_id')).toEqual([{ interviewer_id: org.users.interviewer.id }]);
  });

  it('rejects an id the same interviewer used in another project', async () => {
    const item = complete(someone());
    await interviewer.post(syncPath, { interviews: [item] });
    const [second] = await h.db('projects').insert({ organisation_id: org.id, name: 'Second project', target_size: 10 }).returning('id');
    await h.db('project_members').insert({ project_id: second!.id, user_id: org.users.interviewer.id });
    const refusal = { id: item.id.toUpperCase(), disposition: 'refusal', startedAt: '2026-11-20T11:00:00Z', endedAt: '2026-11-20T11:01:00Z' };
    const res = await interviewer.post(`/api/projects/${second!.id}/interviews/sync`, { interviews: [refusal] });
    expect(res.body.results[0]).toMatchObject({ id: item.id, status: 'rejected' });
    expect(await h.db('interviews').where({ id: item.id }).select('project_id')).toEqual([{ project_id: org.projectId }]);
  });

  it('never answers accepted twice when batches for two projects race with the same ids', async () => {
    const [second] = await h.db('projects').insert({ organisation_id: org.id, name: 'Racing project', target_size: 10 }).returning('id');
    await h.db('project_members').insert({ project_id: second!.id, user_id: org.users.interviewer.id });
    const refusals = Array.from({ length: 20 }, () => ({ id: randomUUID(), disposition: 'refusal', startedAt: '2026-11-20T11:00:00Z', endedAt: '2026-11-20T11:01:00Z' }));
    // Hold back every insert until both batches have looked for their ids and found none,
    // so both reach the insert: the race that the project lock does not cover.
    const gate = await h.db.transaction();
    await gate.raw('LOCK TABLE interviews IN SHARE ROW EXCLUSIVE MODE');
    const racing = Promise.all([
      interviewer.post(syncPath, { interviews: refusals }),
      interviewer.post(`/api/projects/${second!.id}/interviews/sync`, { interviews: refusals.map((r) => ({ ...r, id: r.id.toUpperCase() })) }),
    ]);
    const waiting = async () =>
      Number((await h.db.raw(`SELECT count(*) AS n FROM pg_locks WHERE NOT granted AND relation = 'interviews'::regclass`)).rows[0].n);
    for (let i = 0; i < 200 && (await waiting()) < 2; i++) await new Promise((r) => setTimeout(r, 25));
    expect(await waiting()).toBe(2);
    await gate.commit();
    const [a, b] = await racing;
    const stored = new Map((await h.db('interviews').whereIn('id', refusals.map((r) => r.id)).select('id', 'project_id')).map((r) => [r.id, r.project_id]));
    for (const [index, item] of refusals.entries()) {
      expect([a.body.results[index].status, b.body.results[index].status].sort()).toEqual(['accepted', 'rejected']);
      expect(stored.get(item.id)).toBe(a.body.results[index].status === 'accepted' ? org.projectId : second!.id);
    }
  });

  it('stores an id repeated inside one batch once: the same interview again is duplicate, a different one rejected', async () => {
    const item = complete(someone());
    const other = { ...complete(pick(targets, { age: '18-34', sex: 'female', region: 'North' })), id: item.id.toUpperCase() };
    const res = await interviewer.post(syncPath, { interviews: [item, { ...item, id: item.id.toUpperCase() }, other] });
    expect(res.body.results).toEqual([
      { id: item.id, status: 'accepted', overQuota: false, overQuotaCells: [], flags: [] },
      { id: item.id, status: 'duplicate' },
      { id: item.id, status: 'rejected', reason: 'another interview in this batch has the same id' },
    ]);
    expect(res.body).toMatchObject({ accepted: 1, duplicates: 1, rejected: 1 });
    expect(await rowCount([item.id])).toBe(1);
  });

  it('rejects every copy of a repeated id when the first copy cannot be stored, never answering duplicate', async () => {
    const item = { ...complete(someone()), categories: { ...someone(), [targets.variables[2]!.id]: randomUUID() } };
    const res = await interviewer.post(syncPath, { interviews: [item, item] });
    expect(res.body.results.map((r: Result) => r.status)).toEqual(['rejected', 'rejected']);
    expect(await rowCount([item.id])).toBe(0);
  });
});
