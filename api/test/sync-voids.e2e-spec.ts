// Voids (issue 10, item 5): an interview already sent can be voided with a reason, as a sync
// item of kind "void" from the interviewer who logged it, or by a supervisor. It stops
// counting at once (cells and balance), the row keeps who, when and why, and the flag
// "voided" shows on the board; voiding again changes nothing.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, PASSWORD, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, syncProject, type Targets } from './fieldwork-helpers.js';
import { hashPassword } from '../src/auth/password.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let base: string;
let interviewer: Awaited<ReturnType<typeof client>>;
let lead: Awaited<ReturnType<typeof client>>;

beforeAll(async () => {
  h = await startApp();
  ({ org, targets, syncPath, interviewer, lead } = await syncProject(h, 'Voids'));
  base = `/api/projects/${org.projectId}`;
});
afterAll(() => h.close());

const young = () => pick(targets, { age: '18-34', sex: 'female', region: 'North' });
const achieved = async (label: string) =>
  ((await lead.get(`${base}/cells`)).body.cells as { label: string; achieved: number }[]).find((c) => c.label === label)!.achieved;
const voidItem = (id: string, reason = 'Logged twice by mistake') => ({ kind: 'void', id, reason });

describe('voiding an interview already sent', () => {
  it('drops it from the cells and the balance at once, keeps who, when and why, and flags it', async () => {
    const batch = [complete(young(), 'yes' as never), complete(young(), 'no' as never), complete(young(), 'dont_know' as never)];
    expect((await interviewer.post(syncPath, { interviews: batch })).body.accepted).toBe(3);
    const cellBefore = await achieved('region: North');
    const balanceBefore = (await lead.get(`${base}/balance`)).body;

    const reply = await interviewer.post(syncPath, { interviews: [voidItem(batch[0]!.id.toUpperCase())] });
    expect(reply.status).toBe(200);
    expect(reply.body).toMatchObject({ accepted: 0, duplicates: 0, voided: 1, rejected: 0 });
    expect(reply.body.results).toEqual([{ id: batch[0]!.id, status: 'voided' }]);
    // The reply's cells already count without it, as does the board.
    const northInReply = reply.body.cells.find((c: { label: string }) => c.label === 'region: North');
    expect(northInReply.achieved).toBe(cellBefore - 1);
    expect(await achieved('region: North')).toBe(cellBefore - 1);
    const balanceAfter = (await lead.get(`${base}/balance`)).body;
    expect(balanceAfter.n).toBe(balanceBefore.n - 1);
    expect(balanceAfter.outcome.answered).toBe(balanceBefore.outcome.answered - 1);

    const row = await h.db('interviews').where({ id: batch[0]!.id }).first();
    expect(row).toMatchObject({ voided_by: org.users.interviewer.id, void_reason: 'Logged twice by mistake', counted: false });
    expect(row!.voided_at).toBeInstanceOf(Date);
    expect(row!.flags).toContain('voided');
    const flags = (await lead.get(`${base}/interviews/flags`)).body;
    expect(flags.byReason).toContainEqual({ code: 'voided', reason: expect.stringMatching(/^Voided after it was sent/), count: 1 });
    expect(flags.voided).toEqual([{
      id: batch[0]!.id, disposition: 'complete', fieldDay: '2026-11-20', interviewer: expect.stringMatching(/^interviewer /),
      voidedBy: expect.stringMatching(/^interviewer /), voidedAt: row!.voided_at!.toISOString(), reason: 'Logged twice by mistake',
    }]);
    // The export lists counted interviews only.
    expect((await lead.get(`${base}/interviews/export.csv`)).text).not.toContain(batch[0]!.id);
  });

  it('answers a second void of the same interview duplicate and changes nothing', async () => {
    const [one] = [complete(young())];
    await interviewer.post(syncPath, { interviews: [one] });
    await interviewer.post(syncPath, { interviews: [voidItem(one!.id, 'First reason')] });
    const before = await achieved('region: North');
    const again = await interviewer.post(syncPath, { interviews: [voidItem(one!.id, 'Second reason'), voidItem(one!.id, 'Third')] });
    expect(again.body).toMatchObject({ voided: 0, duplicates: 2, rejected: 0 });
    expect(await achieved('region: North')).toBe(before);
    expect((await h.db('interviews').where({ id: one!.id }).first())!.void_reason).toBe('First reason');
  });

  it('refuses a void from another interviewer with a clear reason, and changes nothing', async () => {
    const [mine] = [complete(young())];
    await interviewer.post(syncPath, { interviews: [mine] });
    const [other] = await h.db('users')
      .insert({ organisation_id: org.id, email: `second.${mine!.id.slice(0, 8)}@voids.example`, name: 'Second', role: 'interviewer', password_hash: await hashPassword(PASSWORD) })
      .returning('*');
    await h.db('project_members').insert({ project_id: org.projectId, user_id: other!.id });
    const second = await client(h, { ...org, users: { ...org.users, interviewer: { id: other!.id, email: other!.email } } }, 'interviewer');
    const before = await achieved('region: North');
    const reply = await second.post(syncPath, { interviews: [voidItem(mine!.id)] });
    expect(reply.status).toBe(200);
    expect(reply.body.results).toEqual([{ id: mine!.id, status: 'rejected', reason: 'only the interviewer who logged this interview, or a supervisor, can void it' }]);
    expect(await achieved('region: North')).toBe(before);
    expect((await h.db('interviews').where({ id: mine!.id }).first())!.voided_at).toBeNull();
  });

  it('refuses a void without a usable reason or of an unknown interview, item by item, and stores the rest', async () => {
    const [kept] = [complete(young())];
    await interviewer.post(syncPath, { interviews: [kept] });
    const before = await achieved('region: North');
    const fresh = complete(young());
    const reply = await interviewer.post(syncPath, {
      interviews: [
        { kind: 'void', id: kept!.id, reason: '   ' },
        { kind: 'void', id: kept!.id },
        { kind: 'void', id: kept!.id, reason: 'x'.repeat(501) },
        { kind: 'void', id: kept!.id, reason: 'ok', extra: 1 },
        { kind: 'void', id: 'not-a-uuid', reason: 'ok' },
        voidItem('0b6f7a52-3f1c-4c1e-9a55-2d7c4b1e8f00'),
        fresh,
      ],
    });
    expect(reply.body.results.map((r: { status: string; reason?: string }) => r.reason ?? r.status)).toEqual([
      'reason must not be empty or only spaces',
      'reason must be text',
      'reason must be at most 500 characters long',
      'extra is not part of a void',
      'id must be a UUID',
      'no interview with this id was sent for this project',
      'accepted',
    ]);
    expect(await achieved('region: North')).toBe(before + 1);
    expect((await h.db('interviews').where({ id: kept!.id }).first())!.voided_at).toBeNull();
  });

  it('lets a supervisor void any interview of the project with a reason; an interviewer cannot use that route', async () => {
    const [one] = [complete(young())];
    await interviewer.post(syncPath, { interviews: [one] });
    const supervisor = await client(h, org, 'supervisor');
    const before = await achieved('region: North');
    const path = `${base}/interviews/${one!.id}/void`;
    expect((await interviewer.post(path, { reason: 'mine' })).status).toBe(403);
    expect((await supervisor.post(path, { reason: '' })).status).toBe(400);
    const done = await supervisor.post(path, { reason: 'Respondent outside the survey population' });
    expect(done.status).toBe(200);
    expect(done.body).toEqual({ id: one!.id, status: 'voided' });
    expect((await supervisor.post(path, { reason: 'again' })).body.status).toBe('duplicate');
    expect(await achieved('region: North')).toBe(before - 1);
    expect((await h.db('interviews').where({ id: one!.id }).first())!.voided_by).toBe(org.users.supervisor.id);
    const elsewhere = await createOrg(h.db, 'Elsewhere');
    const stranger = await client(h, elsewhere, 'supervisor');
    expect((await stranger.post(path, { reason: 'not mine' })).status).toBe(404);
  });
});
