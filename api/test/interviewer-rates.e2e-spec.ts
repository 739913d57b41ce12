// The interviewers' rates (issue 11, item 4) and their effect on the headline on the balance
// (item 5): each interviewer's AAPOR rates equal the engine's outcomeRates on hand-counted
// groups with e estimated once for the project; 'turned away: cell full' counts as not
// eligible, non-contacts of unknown eligibility as UH; the balance's all-sources design effect
// is Kish's weighting design effect times the interviewer design effect.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../src/auth/password.js';
import { deviationsFromCellMeans, interviewerCorrelation } from '../src/estimation/interviewer-correlation.js';
import { outcomeRates } from '../src/estimation/outcome-rates.js';
import { client, complete, pick, syncProject, type Targets } from './fieldwork-helpers.js';
import { buildOpenApiDocument } from '../src/openapi/openapi-document.js';
import { createOrg, PASSWORD, signIn, startApp, type Harness, type TestOrg } from './harness.js';
import { conformanceProblems, responseSchema } from './openapi-conformance.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let syncPath: string;
let ratesPath: string;
let interviewer: Awaited<ReturnType<typeof client>>;
let second: { id: string; post: (path: string, body: object) => ReturnType<ReturnType<Harness['http']>['post']> };

const at = (day: string, hour = 10) => `2026-11-${day}T${String(hour).padStart(2, '0')}:00:00.000Z`;
function contact(disposition: string, extra: Record<string, unknown> = {}, day = '20') {
  return { id: randomUUID(), disposition, startedAt: at(day, 9), endedAt: at(day, 9).replace(':00:00', ':05:00'), ...extra };
}
const people = [
  { age: '18-34', sex: 'female', region: 'North' },
  { age: '35-59', sex: 'male', region: 'South' },
  { age: '60+', sex: 'female', region: 'Coast' },
  { age: '18-34', sex: 'male', region: 'North' },
];

beforeAll(async () => {
  h = await startApp();
  ({ org, targets, syncPath, interviewer } = await syncProject(h, 'Rates', { fieldStart: '2026-11-16', fieldEnd: '2026-12-06', status: 'fieldwork' }));
  ratesPath = `/api/projects/${org.projectId}/interviewers/rates`;
  const email = `second.${randomUUID().slice(0, 8)}@rates.example`;
  const [row] = await h.db('users').insert({ organisation_id: org.id, email, name: 'Second interviewer', role: 'interviewer', password_hash: await hashPassword(PASSWORD) }).returning('id');
  await h.db('project_members').insert({ project_id: org.projectId, user_id: row!.id });
  const { accessToken } = await signIn(h, email);
  second = { id: row!.id, post: (path, body) => h.http().post(path).set({ Authorization: `Bearer ${accessToken}` }).send(body) };

  // First interviewer: 4 completes over two days (yes, yes, yes, no), a partial, 2 refusals,
  // a non-contact where someone eligible lives, 2 of unknown eligibility, an 'other' of unknown
  // eligibility, one not eligible and one turned away because the cell was full.
  const mine = [
    ...people.map((p, i) => complete(pick(targets, p), i < 3, at(i < 2 ? '20' : '21'))),
    contact('partial'), contact('refusal'), contact('refusal', {}, '21'),
    contact('non_contact', { eligibilityKnown: true }), contact('non_contact'), contact('non_contact', { eligibilityKnown: false }),
    contact('other'), contact('not_eligible'), contact('quota_full', { categories: pick(targets, people[0]!) }),
  ];
  expect((await interviewer.post(syncPath, { interviews: mine })).body).toMatchObject({ accepted: mine.length, rejected: 0 });
  // Second interviewer: 4 completes (no, no, no, yes), 3 refusals, an 'other' of known eligibility, 2 not eligible.
  const theirs = [
    ...people.map((p, i) => complete(pick(targets, p), i === 3, at('20', 11 + i))),
    contact('refusal'), contact('refusal'), contact('refusal'), contact('other', { eligibilityKnown: true }), contact('not_eligible'), contact('not_eligible'),
  ];
  expect((await second.post(syncPath, { interviews: theirs })).body).toMatchObject({ accepted: theirs.length, rejected: 0 });
});
afterAll(() => h.close());

describe('interviewers’ rates', () => {
  it('are the engine’s outcome rates on hand-counted groups, e estimated once for the project', async () => {
    const res = await (await client(h, org, 'supervisor')).get(ratesPath);
    expect(res.status).toBe(200);
    const first = { I: 4, P: 1, R: 2, NC: 1, O: 0, UH: 2, UO: 1, NE: 2 };
    const other = { I: 4, P: 0, R: 3, NC: 0, O: 1, UH: 0, UO: 0, NE: 2 };
    // Resolved cases: (I+P+R+NC+O) = 8 + 8 = 16 eligible, NE = 4.
    const e = 16 / 20;
    expect(res.body.e).toBeCloseTo(e, 12);
    expect(res.body.rateNames).toEqual(['COOP1', 'REF2', 'CON2']);
    const byId = new Map(res.body.interviewers.map((x: { interviewerId: string }) => [x.interviewerId, x]));
    for (const [id, counts] of [[org.users.interviewer.id, first], [second.id, other]] as const) {
      const row = byId.get(id) as { groups: object; rates: Record<string, number>; contacts: number; completes: number };
      expect(row.groups).toEqual(counts);
      const expected = outcomeRates(counts, e);
      expect(row.rates.COOP1).toBeCloseTo(expected.COOP1!, 12);
      expect(row.rates.REF2).toBeCloseTo(expected.REF2!, 12);
      expect(row.rates.CON2).toBeCloseTo(expected.CON2!, 12);
    }
    const mine = byId.get(org.users.interviewer.id) as Record<string, unknown> & { days: { fieldDay: string; contacts: number; completes: number }[] };
    expect(mine).toMatchObject({ contacts: 13, completes: 4, outcomes: { quota_full: 1, not_eligible: 1, non_contact: 3 }, medianDurationSeconds: 15 * 60 });
    expect(mine.days.map((d) => [d.fieldDay, d.contacts, d.completes])).toEqual([['2026-11-20', 10, 2], ['2026-11-21', 3, 2]]);
    // Every interviewer with completes has at least one back-check (their first complete here), not yet done.
    expect(mine).toMatchObject({ findings: [], test: null, backchecks: { selected: 1, confirmed: 0, notConfirmed: 0, notReached: 0, pending: 1 } });
  });

  it('refuses eligibility on an outcome that does not ask for it, storing nothing', async () => {
    const bad = contact('refusal', { eligibilityKnown: true });
    const res = await interviewer.post(syncPath, { interviews: [bad] });
    expect(res.body.results[0]).toEqual({ id: bad.id, status: 'rejected', reason: 'eligibilityKnown is only for a non-contact or an other outcome' });
    expect(await h.db('interviews').where({ id: bad.id }).first()).toBeUndefined();
  });

  it('are for the office: supervisors and leads read them; interviewers and clients are refused', async () => {
    const read = await (await client(h, org, 'lead')).get(ratesPath);
    expect(read.status).toBe(200);
    // The answer matches the OpenAPI document the client's types come from, exactly.
    const doc = buildOpenApiDocument(h.app);
    expect(conformanceProblems(doc, responseSchema(doc, 'get', '/api/projects/{projectId}/interviewers/rates', 200), read.body)).toEqual([]);
    expect((await interviewer.get(ratesPath)).status).toBe(403);
    expect((await (await client(h, org, 'client')).get(ratesPath)).status).toBe(403);
    const rival = await createOrg(h.db, 'RatesRival');
    expect((await (await client(h, rival, 'supervisor')).get(ratesPath)).status).toBe(404);
  });
});

describe('the interviewers’ effect on the balance', () => {
  it('is the correlation on answers minus their cell mean, and the all-sources design effect is Kish × the interviewer’s', async () => {
    const res = await (await client(h, org, 'lead')).get(`/api/projects/${org.projectId}/balance`);
    const doc = buildOpenApiDocument(h.app);
    expect(conformanceProblems(doc, responseSchema(doc, 'get', '/api/projects/{projectId}/balance', 200), res.body)).toEqual([]);
    const balance = res.body;
    const effect = balance.interviewerEffect;
    const rows = people.flatMap((p, i) => [
      { interviewer: 'first', cell: JSON.stringify(p), value: i < 3 ? 1 : 0 },
      { interviewer: 'second', cell: JSON.stringify(p), value: i === 3 ? 1 : 0 },
    ]);
    const expected = interviewerCorrelation([...deviationsFromCellMeans(rows).values()])!;
    expect(effect).toMatchObject({ interviewers: 2, interviews: 8 });
    expect(effect.rawRho).toBeCloseTo(expected.rawRho, 12);
    expect(effect.rho).toBeCloseTo(expected.rho, 12);
    expect(effect.designEffect).toBeCloseTo(expected.designEffect, 12);
    expect(balance.designEffect).toBeGreaterThanOrEqual(1);
    expect(effect.allSourcesDesignEffect).toBeCloseTo(balance.designEffect * expected.designEffect, 12);
    expect(effect.allSourcesEffectiveSampleSize).toBeCloseTo(balance.n / (balance.designEffect * expected.designEffect), 9);
  });
});
