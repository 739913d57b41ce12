// "Where the next interviews help most" over the API: who may read it, bad counts refused,
// and the plan equal to the estimation core run on the interviews the test itself sent.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { nextInterviews, type EffortQuotaCell } from '../src/estimation/next-interviews.js';
import type { RakingCell } from '../src/estimation/raking.js';
import { client, complete, pick, TARGETS, type Targets } from './fieldwork-helpers.js';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';

type Api = Awaited<ReturnType<typeof client>>;
let h: Harness;
let org: TestOrg;
let targets: Targets;
let lead: Api;
let supervisor: Api;
let interviewer: Api;
const base = () => `/api/projects/${org.projectId}/next-interviews`;
const sent: Record<string, string>[] = [];

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Effort');
  lead = await client(h, org, 'lead');
  supervisor = await client(h, org, 'supervisor');
  interviewer = await client(h, org, 'interviewer');
  await lead.patch(`/api/projects/${org.projectId}`, { targetSize: 100, headlineQuestion: 'Support?' });
  targets = (await lead.put(`/api/projects/${org.projectId}/targets`, TARGETS)).body;
});
afterAll(() => h.close());

async function log(labels: Record<string, string>[]) {
  const batch = labels.map((l) => complete(pick(targets, l)));
  const res = await interviewer.post(`/api/projects/${org.projectId}/interviews/sync`, { interviews: batch });
  expect(res.body.accepted).toBe(batch.length);
  sent.push(...labels);
}

describe('where the next interviews help most', () => {
  it('says what is missing before weights can be computed', async () => {
    await log([{ age: '18-34', sex: 'female', region: 'North' }, { age: '35-59', sex: 'male', region: 'South' }]);
    const res = await supervisor.get(base());
    expect(res.status).toBe(200);
    expect(res.body.plan).toEqual([]);
    expect(res.body.problem).toMatch(/^No completed interviews yet in age: 60\+/);
  });

  it('plans the next interviews as the estimation core does on the interviews sent, and names the costly cells', async () => {
    const ages = ['18-34', '35-59', '60+'];
    const sexes = ['female', 'male'];
    const regions = ['North', 'South', 'Coast'];
    // Every age × sex with every region, then a crowd of young women in the North (target 16).
    await log(Array.from({ length: 18 }, (_, i) => ({ age: ages[i % 3]!, sex: sexes[i % 2]!, region: regions[Math.floor(i / 6) % 3]! })));
    await log(Array.from({ length: 20 }, () => ({ age: '18-34', sex: 'female', region: 'North' })));

    const res = await supervisor.get(`${base()}?count=50`);
    expect(res.status).toBe(200);
    expect(res.body.problem).toBeNull();

    const cells: RakingCell[] = sent.map((categories) => ({ categories, count: 1 }));
    const board = (await supervisor.get(`/api/projects/${org.projectId}/quota-board`)).body;
    const labelOf = new Map(targets.variables.flatMap((v) => v.categories.map((c) => [c.id, [v.name, c.label]] as const)));
    const quota: EffortQuotaCell[] = board.cells.map((c: { id: string; label: string; categoryIds: string[]; target: number; achieved: number }) => ({
      id: c.id, label: c.label, target: c.target, achieved: c.achieved,
      categories: Object.fromEntries(c.categoryIds.map((id) => labelOf.get(id)!)),
    }));
    const margins = TARGETS.variables.map((v) => ({ variable: v.name, shares: v.categories.map((c) => ({ category: c.label, share: c.share })) }));
    const expected = nextInterviews(cells, margins, quota, 50);

    expect(res.body.n).toBe(40);
    expect(res.body.plan).toEqual(expected.plan);
    expect(res.body.planned).toBe(50);
    expect(res.body.effectiveSampleSize).toBeCloseTo(expected.effectiveSampleSize, 6);
    expect(res.body.effectiveSampleSizeAfter).toBeGreaterThan(res.body.effectiveSampleSize);
    // The same effective sample size the lead's balance page shows.
    const balance = (await lead.get(`/api/projects/${org.projectId}/balance`)).body;
    expect(res.body.effectiveSampleSize).toBeCloseTo(balance.effectiveSampleSize, 4);

    const crowded = quota.find((q) => q.categories.age === '18-34' && q.categories.sex === 'female')!;
    expect(crowded.achieved).toBeGreaterThan(crowded.target);
    expect(res.body.costly.map((c: { id: string }) => c.id)).toContain(crowded.id);
    expect(res.body.plan.map((p: { id: string }) => p.id)).not.toContain(crowded.id);
  });

  it('is read by the lead too, and the default plan is 50 interviews', async () => {
    const res = await lead.get(base());
    expect(res.status).toBe(200);
    expect(res.body.count).toBe(50);
  });

  it('refuses interviewers and clients', async () => {
    expect((await interviewer.get(base())).status).toBe(403);
    expect((await (await client(h, org, 'client')).get(base())).status).toBe(403);
  });

  it('refuses a count that is not a whole number from 1 to 200, naming the field', async () => {
    for (const bad of ['0', '201', '2.5', 'many', '-3']) {
      const res = await supervisor.get(`${base()}?count=${bad}`);
      expect(res.status).toBe(400);
      expect(JSON.stringify(res.body)).toMatch(/count must/);
    }
  });
});
