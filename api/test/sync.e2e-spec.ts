import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, syncProject, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let interviewer: Awaited<ReturnType<typeof client>>;

const rowCount = async (ids: string[]) => Number((await h.db('interviews').whereIn('id', ids).count({ n: '*' }))[0]!.n);

beforeAll(async () => {
  h = await startApp();
  ({ org, targets, syncPath, interviewer } = await syncProject(h, 'Sync'));
});
afterAll(() => h.close());

const someone = () => pick(targets, { age: '35-59', sex: 'male', region: 'South' });

describe('interview sync', () => {
  it('stores the categories seen at a partial or refusal, which count as contacts but never as completes', async () => {
    const seen = pick(targets, { age: '60+', sex: 'female' });
    const partial = { ...complete(seen), disposition: 'partial', headlineAnswer: undefined };
    const refusal = { ...complete(pick(targets, { region: 'Coast' })), disposition: 'refusal', headlineAnswer: undefined };
    const reply = await interviewer.post(syncPath, { interviews: [partial, refusal] });
    expect(reply.body).toMatchObject({ accepted: 2, rejected: 0 });
    const rows = await h.db('interviews').whereIn('id', [partial.id, refusal.id]).orderBy('disposition').select('disposition', 'category_ids', 'counted');
    expect(rows.map((r) => [r.disposition, r.category_ids.sort(), r.counted])).toEqual([
      ['partial', Object.values(seen).sort(), false],
      ['refusal', Object.values(pick(targets, { region: 'Coast' })), false],
    ]);
  });

  it('accepts a batch once; the same batch again is all duplicates and adds no rows', async () => {
    const batch = Array.from({ length: 5 }, () => complete(someone()));
    const first = await interviewer.post(syncPath, { interviews: batch });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ accepted: 5, duplicates: 0, rejected: 0 });
    const again = await interviewer.post(syncPath, { interviews: batch });
    expect(again.body).toMatchObject({ accepted: 0, duplicates: 5, rejected: 0 });
    expect(await rowCount(batch.map((b) => b.id))).toBe(5);
  });

  it('stores each interview exactly once when two identical batches race', async () => {
    const batch = Array.from({ length: 40 }, () => complete(someone()));
    const [a, b] = await Promise.all([
      interviewer.post(syncPath, { interviews: batch }),
      interviewer.post(syncPath, { interviews: batch }),
    ]);
    expect(a.body.accepted + b.body.accepted).toBe(40);
    expect(a.body.duplicates + b.body.duplicates).toBe(40);
    expect(await rowCount(batch.map((x) => x.id))).toBe(40);
  });

  it('loses and duplicates nothing when the connection drops mid-sync and the device retries', async () => {
    const batch = Array.from({ length: 200 }, () => complete(someone()));
    const controller = new AbortController();
    const address = h.app.getHttpServer().address() ?? (await h.app.listen(0, '127.0.0.1'), h.app.getHttpServer().address());
    const url = `http://127.0.0.1:${(address as { port: number }).port}${syncPath}`;
    const dropped = fetch(url, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${interviewer.token}` },
      body: JSON.stringify({ interviews: batch }),
      signal: controller.signal,
    }).catch((e: Error) => e);
    setTimeout(() => controller.abort(), 5);
    expect(await dropped).toBeInstanceOf(Error);
    const retry = await interviewer.post(syncPath, { interviews: batch });
    expect(retry.status).toBe(200);
    expect(retry.body.accepted + retry.body.duplicates).toBe(200);
    expect(await rowCount(batch.map((x) => x.id))).toBe(200);
  });

  it('rejects bad items with reasons and accepts the rest of the batch', async () => {
    const good = complete(someone());
    const unknownCategory = complete({ ...someone(), [targets.variables[2]!.id]: randomUUID() });
    const missingVariable = complete(pick(targets, { age: '18-34', sex: 'female' }));
    const noAnswer = { ...complete(someone()), headlineAnswer: undefined };
    const badId = { ...complete(someone()), id: 'phone-7' };
    const extra = { ...complete(someone()), respondentName: 'Jo Bloggs' };
    const backwards = { ...complete(someone()), endedAt: '2026-11-20T09:00:00.000Z' };
    const refusal = { id: randomUUID(), disposition: 'refusal', startedAt: '2026-11-20T11:00:00Z', endedAt: '2026-11-20T11:01:00Z' };
    const res = await interviewer.post(syncPath, {
      interviews: [good, unknownCategory, missingVariable, noAnswer, badId, extra, backwards, refusal, 'nonsense'],
    });
    expect(res.status).toBe(200);
    const byId = res.body.results;
    expect(byId.map((r: { status: string }) => r.status)).toEqual([
      'accepted', 'rejected', 'accepted', 'rejected', 'rejected', 'rejected', 'rejected', 'accepted', 'rejected',
    ]);
    expect(byId[1].reason).toMatch(/^region: unknown category/);
    expect(byId[3].reason).toBe('headlineAnswer is missing');
    expect(byId[4].reason).toBe('id must be a UUID');
    expect(byId[5].reason).toBe('respondentName is not part of an interview');
    expect(byId[6].reason).toBe('endedAt is before startedAt');
    expect(await rowCount([good.id, refusal.id, missingVariable.id, unknownCategory.id, extra.id])).toBe(3);
    // A variable added after the phone last synced: the complete is kept and flagged.
    expect((await h.db('interviews').where({ id: missingVariable.id }).first('flags'))!.flags).toEqual(['missing_variable']);
  });

  it('accepts an interview for a cell that filled meanwhile, marked over quota', async () => {
    const lead = await client(h, org, 'lead');
    const cells = (await lead.get(`/api/projects/${org.projectId}/cells`)).body.cells;
    const cell = cells.find((c: { label: string }) => c.label === 'age: 60+ × sex: female');
    const batch = Array.from({ length: cell.target + 1 }, () => complete(pick(targets, { age: '60+', sex: 'female', region: 'North' })));
    const res = await interviewer.post(syncPath, { interviews: batch });
    expect(res.body.accepted).toBe(cell.target + 1);
    expect(res.body.results.filter((r: { overQuota: boolean }) => r.overQuota)).toHaveLength(1);
    expect(res.body.results.at(-1).overQuota).toBe(true);
    const after = res.body.cells.find((c: { id: string }) => c.id === cell.id);
    expect(after).toMatchObject({ achieved: cell.target + 1, status: 'full', overQuota: 1 });
  });

  it('marks interviews in a cell a supervisor closed as over quota; reopening clears the status', async () => {
    const supervisor = await client(h, org, 'supervisor');
    const cells = (await supervisor.get(`/api/projects/${org.projectId}/cells`)).body.cells;
    const cell = cells.find((c: { label: string }) => c.label === 'age: 18-34 × sex: male');
    const closed = await supervisor.post(`/api/projects/${org.projectId}/cells/${cell.id}/close`);
    expect(closed.body.status).toBe('closed');
    const res = await interviewer.post(syncPath, { interviews: [complete(pick(targets, { age: '18-34', sex: 'male', region: 'North' }))] });
    expect(res.body.results[0]).toMatchObject({ status: 'accepted', overQuota: true });
    const reopened = await supervisor.post(`/api/projects/${org.projectId}/cells/${cell.id}/reopen`);
    expect(reopened.body.status).not.toBe('closed');
  });

  it('answers with the cells as they stand after the batch, the same as a fresh read', async () => {
    const known = complete(someone());
    await interviewer.post(syncPath, { interviews: [known] });
    const batch = [...Array.from({ length: 25 }, () => complete(someone())), known, { ...complete(someone()), id: 'not-a-uuid' }];
    const res = await interviewer.post(syncPath, { interviews: batch });
    expect(res.body).toMatchObject({ accepted: 25, duplicates: 1, rejected: 1 });
    const fresh = (await interviewer.get(`/api/projects/${org.projectId}/cells`)).body.cells;
    expect(res.body.cells).toEqual(fresh);
  });

  it('refuses batches over 1,000 interviews as a whole', async () => {
    const batch = Array.from({ length: 1001 }, () => complete(someone()));
    const res = await interviewer.post(syncPath, { interviews: batch });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('interviews may hold at most 1000 items per batch');
    expect(await rowCount(batch.slice(0, 10).map((x) => x.id))).toBe(0);
  });

  it('refuses an interviewer not assigned to the project, a client, and another organisation', async () => {
    await h.db('project_members').where({ project_id: org.projectId, user_id: org.users.interviewer.id }).delete();
    const item = complete(someone());
    const unassigned = await interviewer.post(syncPath, { interviews: [item] });
    await h.db('project_members').insert({ project_id: org.projectId, user_id: org.users.interviewer.id });
    expect(unassigned.status).toBe(403);
    expect(unassigned.body.message).toBe('You are not assigned to this project; ask your supervisor to add you');
    const clientUser = await client(h, org, 'client');
    expect((await clientUser.post(syncPath, { interviews: [item] })).status).toBe(403);
    const other = await createOrg(h.db, 'Rival');
    const rival = await client(h, other, 'interviewer');
    expect((await rival.post(syncPath, { interviews: [item] })).status).toBe(404);
    expect(await rowCount([item.id])).toBe(0);
  });
});

describe('quota board', () => {
  it('shows the supervisor every cell and each interviewer’s completes', async () => {
    const supervisor = await client(h, org, 'supervisor');
    const res = await supervisor.get(`/api/projects/${org.projectId}/quota-board`);
    expect(res.status).toBe(200);
    expect(res.body.cells).toHaveLength(9);
    const me = res.body.interviewers.find((i: { id: string }) => i.id === org.users.interviewer.id);
    const completes = Number((await h.db('interviews').where({ interviewer_id: org.users.interviewer.id, disposition: 'complete' }).count({ n: '*' }))[0]!.n);
    expect(me.completesTotal).toBe(completes);
    for (const cell of res.body.cells) expect(cell.remaining).toBe(Math.max(0, cell.target - cell.achieved));
  });

  it('is not shown to interviewers or clients', async () => {
    expect((await interviewer.get(`/api/projects/${org.projectId}/quota-board`)).status).toBe(403);
    expect((await (await client(h, org, 'client')).get(`/api/projects/${org.projectId}/quota-board`)).status).toBe(403);
  });
});

describe('field days', () => {
  it('counts a contact on the calendar day of the project’s time zone, and re-dates them when the zone changes', async () => {
    const lead = await client(h, org, 'lead');
    // 23:30 on 20 November in London is already 21 November in Auckland (UTC+13 in summer there).
    const late = { ...complete(someone()), startedAt: '2026-11-20T23:10:00.000Z', endedAt: '2026-11-20T23:30:00.000Z' };
    expect((await lead.patch(`/api/projects/${org.projectId}`, { timeZone: 'Europe/London' })).body.timeZone).toBe('Europe/London');
    expect((await interviewer.post(syncPath, { interviews: [late] })).body.accepted).toBe(1);
    const dayOf = async () => (await h.db('interviews').where({ id: late.id }).first('field_day'))!.field_day;
    expect(await dayOf()).toBe('2026-11-20');
    await lead.patch(`/api/projects/${org.projectId}`, { timeZone: 'Pacific/Auckland' });
    expect(await dayOf()).toBe('2026-11-21');
    const exported = (await lead.get(`/api/projects/${org.projectId}/interviews/export.csv`)).text;
    expect(exported.split('\n').find((line: string) => line.startsWith(late.id))).toContain(',2026-11-21,');
  });

  it('refuses a time zone that does not exist, changing nothing', async () => {
    const lead = await client(h, org, 'lead');
    const res = await lead.patch(`/api/projects/${org.projectId}`, { timeZone: 'Vellmoor/Central' });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('timeZone must be a time zone name such as Europe/London');
    expect((await lead.get(`/api/projects/${org.projectId}`)).body.timeZone).toBe('Pacific/Auckland');
  });
});
