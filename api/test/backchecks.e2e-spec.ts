// Back-checks (issue 11, item 3): selection decided once as completes arrive, from a hash of
// (project seed, interview id) under the interviewer's share; at least one per interviewer; a
// not-confirmed outcome raises that interviewer's share for later arrivals; the respondent
// reference is kept only on a selected interview and deleted a set number of days later.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../src/auth/password.js';
import { deleteExpiredReferences } from '../src/backchecks/reference-deletion.js';
import { selectArrivals } from '../src/backchecks/selection.js';
import { PASSWORD, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, syncProject, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let base: string;
let interviewer: Awaited<ReturnType<typeof client>>;
let lead: Awaited<ReturnType<typeof client>>;
let supervisor: Awaited<ReturnType<typeof client>>;

const SEED = 'backcheck-test-seed';
const DAY = 86_400_000;

beforeAll(async () => {
  h = await startApp();
  ({ org, targets, syncPath, interviewer, lead } = await syncProject(h, 'Backchecks'));
  supervisor = await client(h, org, 'supervisor');
  base = `/api/projects/${org.projectId}`;
  await h.db('projects').where({ id: org.projectId }).update({ quality_seed: SEED });
});
afterAll(() => h.close());

const someone = () => pick(targets, { age: '35-59', sex: 'male', region: 'South' });
const withReference = (n: number) => Array.from({ length: n }, (_, i) => ({ ...complete(someone()), respondentReference: `VM-${1000 + i}` }));
const stored = (interviewerId: string) => h.db('backchecks').where({ project_id: org.projectId, interviewer_id: interviewerId }).select('*');

/** A second interviewer on the project, signed in. */
async function anotherInterviewer(label: string) {
  const email = `${label}.${randomUUID().slice(0, 8)}@backchecks.example`;
  const [user] = await h.db('users').insert({ organisation_id: org.id, email, name: label, role: 'interviewer', password_hash: await hashPassword(PASSWORD) }).returning('*');
  await h.db('project_members').insert({ project_id: org.projectId, user_id: user!.id });
  const { body } = await h.http().post('/api/auth/login').send({ email, password: PASSWORD });
  const auth = { Authorization: `Bearer ${body.accessToken as string}` };
  return { id: user!.id as string, post: (path: string, data: object) => h.http().post(path).set(auth).send(data) };
}

describe('selection on arrival', () => {
  it('selects by the seed and the data, at least one per interviewer, once', async () => {
    const batch = withReference(80);
    expect((await interviewer.post(syncPath, { interviews: batch })).body.accepted).toBe(80);
    const rows = await stored(org.users.interviewer.id);
    expect(rows.length).toBeGreaterThanOrEqual(1);
    // The same seed and data give the same sample: the selection recomputed over what arrived.
    const again = selectArrivals(SEED, { share: 0.1, raiseAfterNotConfirmed: 0.1 }, batch.map((i) => ({ interviewId: i.id, interviewerId: org.users.interviewer.id })), new Map());
    expect(rows.map((r) => r.interview_id).sort()).toEqual(again.map((s) => s.interviewId).sort());
    // Kept only on the selected interviews' back-checks; nowhere for the others.
    for (const row of rows) expect(row.respondent_reference).toBe(batch.find((i) => i.id === row.interview_id)!.respondentReference);
    const notSelected = batch.find((i) => !rows.some((r) => r.interview_id === i.id))!;
    const anywhere = await h.db.raw(`SELECT count(*)::int AS n FROM interviews i WHERE row_to_json(i)::text LIKE ?`, [`%${notSelected.respondentReference}%`]);
    expect(anywhere.rows[0].n).toBe(0);
    // Sent again (a lost reply): duplicates, and nothing selected again.
    expect((await interviewer.post(syncPath, { interviews: batch })).body.duplicates).toBe(80);
    expect(await stored(org.users.interviewer.id)).toHaveLength(rows.length);
  });

  it('refuses a reference that looks like an e-mail address or a phone number', async () => {
    const reply = await interviewer.post(syncPath, {
      interviews: [{ ...complete(someone()), respondentReference: 'ann@example.org' }, { ...complete(someone()), respondentReference: '07700900123' }],
    });
    expect(reply.body.rejected).toBe(2);
    expect(reply.body.results[0].reason).toMatch(/e-mail address/);
    expect(reply.body.results[1].reason).toMatch(/phone number/);
  });

  it('raises the share of an interviewer after a not-confirmed back-check, for later arrivals only', async () => {
    await h.db('projects').where({ id: org.projectId }).update({ quality_settings: { backChecks: { share: 0, raiseAfterNotConfirmed: 0.5 } } });
    const bea = await anotherInterviewer('Bea');
    await bea.post(syncPath, { interviews: Array.from({ length: 10 }, () => complete(someone())) });
    const first = await stored(bea.id);
    expect(first).toHaveLength(1); // at least one, even at a share of 0
    const note = { outcome: 'not_confirmed', note: 'The respondent says the interview took five minutes and was about shopping' };
    expect((await supervisor.post(`${base}/backchecks/${first[0]!.interview_id}/outcome`, note)).status).toBe(200);
    const summary = (await lead.get(`${base}/backchecks/summary`)).body as { interviewerId: string; currentShare: number; notConfirmed: number }[];
    expect(summary.find((s) => s.interviewerId === bea.id)).toMatchObject({ notConfirmed: 1, currentShare: 0.5 });

    await bea.post(syncPath, { interviews: Array.from({ length: 40 }, () => complete(someone())) });
    const later = (await stored(bea.id)).filter((r) => r.interview_id !== first[0]!.interview_id);
    // Binomial(40, 0.5) within 4 standard deviations (about 6 in 100,000 fall outside).
    expect(Math.abs(later.length - 20)).toBeLessThanOrEqual(4 * Math.sqrt(10));
    expect(later.every((r) => r.share_at_selection === 0.5)).toBe(true);
    await h.db('projects').where({ id: org.projectId }).update({ quality_settings: {} });
  });
});

describe('the work list and outcomes', () => {
  it('lists pending back-checks first with what the supervisor needs for the call', async () => {
    const { body, status } = await supervisor.get(`${base}/backchecks`);
    expect(status).toBe(200);
    const pending = body.backchecks.filter((b: { outcome: string | null }) => b.outcome === null);
    expect(body.backchecks.slice(0, pending.length)).toEqual(pending);
    const withCode = pending.find((b: { respondentReference: string | null }) => b.respondentReference);
    expect(withCode).toMatchObject({ interviewerName: expect.any(String), fieldDay: '2026-11-20', headlineAnswer: 'yes', shareAtSelection: 0.1 });
    expect(withCode.categories).toEqual([{ variable: 'age', category: '35-59' }, { variable: 'sex', category: 'male' }, { variable: 'region', category: 'South' }]);
  });

  it('refuses a bad outcome with 400 and changes nothing; records who and when; only "could not reach" can be replaced', async () => {
    const [row] = await stored(org.users.interviewer.id);
    const path = `${base}/backchecks/${row!.interview_id}/outcome`;
    for (const bad of [{ outcome: 'maybe' }, { outcome: 'not_confirmed' }, { outcome: 'not_confirmed', note: '   ' }, { outcome: 'confirmed', extra: 1 }, {}]) {
      expect((await supervisor.post(path, bad)).status).toBe(400);
    }
    expect((await h.db('backchecks').where({ interview_id: row!.interview_id }).first())!.outcome).toBeNull();
    const missed = await supervisor.post(path, { outcome: 'not_reached' });
    expect(missed.body).toMatchObject({ outcome: 'not_reached', recordedByName: expect.stringContaining('supervisor') });
    const done = await lead.post(path, { outcome: 'confirmed', note: 'Same answers' });
    expect(done.status).toBe(200);
    expect(done.body).toMatchObject({ outcome: 'confirmed', outcomeNote: 'Same answers', recordedByName: expect.stringContaining('lead') });
    const late = await supervisor.post(path, { outcome: 'not_confirmed', note: 'changed my mind' });
    expect(late.status).toBe(409);
    expect((await h.db('backchecks').where({ interview_id: row!.interview_id }).first())!.outcome).toBe('confirmed');
    expect((await supervisor.post(`${base}/backchecks/${randomUUID()}/outcome`, { outcome: 'confirmed' })).status).toBe(404);
  });

  it('shows interviewers and clients none of it', async () => {
    const [row] = await stored(org.users.interviewer.id);
    const clientUser = await client(h, org, 'client');
    for (const who of [interviewer, clientUser]) {
      expect((await who.get(`${base}/backchecks`)).status).toBe(403);
      expect((await who.get(`${base}/backchecks/summary`)).status).toBe(403);
      expect((await who.post(`${base}/backchecks/${row!.interview_id}/outcome`, { outcome: 'confirmed' })).status).toBe(403);
    }
  });
});

describe('deleting references', () => {
  it('deletes a reference the set number of days after the back-check, and pending ones once the project is closed', async () => {
    const recorded = (await stored(org.users.interviewer.id)).find((r) => r.outcome && r.respondent_reference)!;
    const pending = (await stored(org.users.interviewer.id)).find((r) => !r.outcome && r.respondent_reference)!;
    const reference = async (id: string) => (await h.db('backchecks').where({ interview_id: id }).first())!;
    await deleteExpiredReferences(h.db, new Date(Date.now() + 29 * DAY));
    expect((await reference(recorded.interview_id)).respondent_reference).not.toBeNull();
    const later = new Date(Date.now() + 31 * DAY);
    await deleteExpiredReferences(h.db, later);
    expect(await reference(recorded.interview_id)).toMatchObject({ respondent_reference: null, reference_deleted_at: later });
    expect((await reference(pending.interview_id)).respondent_reference).toBe(pending.respondent_reference);
    const listed = (await supervisor.get(`${base}/backchecks`)).body.backchecks.find((b: { interviewId: string }) => b.interviewId === recorded.interview_id);
    expect(listed).toMatchObject({ respondentReference: null, referenceDeletedAt: later.toISOString() });

    await h.db('projects').where({ id: org.projectId }).update({ status: 'closed', field_end: '2026-11-30' });
    await deleteExpiredReferences(h.db, later);
    expect(await reference(pending.interview_id)).toMatchObject({ respondent_reference: null, reference_deleted_at: later });
  });
});
