import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { drawRespondent, seeded, VELLMOOR_TARGETS } from '../src/demo/vellmoor.js';
import { client, type Targets } from './fieldwork-helpers.js';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;
let lead: Awaited<ReturnType<typeof client>>;
let base: string;

const POLLS = [
  { source: 'Courier phone poll', fieldStart: '2026-11-18', fieldEnd: '2026-11-21', yes: 412, sampleSize: 1000, methodGroup: 'Phone', groupBias: 'none' },
  { source: 'Panel wave 3', fieldStart: '2026-11-19', fieldEnd: '2026-11-20', share: 0.47, sampleSize: 1500, methodGroup: 'Online panel', groupBias: 'unknown' },
  { source: 'Panel wave 4', fieldStart: '2026-11-24', fieldEnd: '2026-11-25', yes: 690, sampleSize: 1400, methodGroup: 'Online panel', groupBias: 'unknown' },
];

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Benchmarks');
  lead = await client(h, org, 'lead');
  base = `/api/projects/${org.projectId}`;
  await lead.patch(base, { targetSize: 1200, headlineQuestion: 'Do you support the extension?' });
  await lead.put(`${base}/targets`, {
    variables: Object.entries(VELLMOOR_TARGETS).map(([name, shares]) => ({
      name,
      interlocked: name === 'age_band' || name === 'sex',
      categories: Object.entries(shares).map(([label, share]) => ({ label, share })),
    })),
  });
  const targets: Targets = (await lead.get(`${base}/targets`)).body;
  const random = seeded(12);
  const batch = Array.from({ length: 400 }, (_, i) => {
    const r = drawRespondent(random);
    const categories: Record<string, string> = {};
    for (const v of targets.variables) categories[v.id] = v.categories.find((c) => c.label === r.categories[v.name])!.id;
    const at = new Date(Date.UTC(2026, 10, 16 + (i % 10), 10)).toISOString();
    return { id: randomUUID(), disposition: 'complete', categories, headlineAnswer: r.supports ? 'yes' : 'no', startedAt: at, endedAt: at };
  });
  expect((await (await client(h, org, 'interviewer')).post(`${base}/interviews/sync`, { interviews: batch })).body.accepted).toBe(400);
});
afterAll(() => h.close());

describe('benchmark polls', () => {
  it('records polls; a share becomes its rounded yes count', async () => {
    for (const poll of POLLS) expect((await lead.post(`${base}/benchmarks`, poll)).status).toBe(201);
    const { polls } = (await lead.get(`${base}/benchmarks`)).body;
    expect(polls).toHaveLength(3);
    expect(polls.find((p: { source: string }) => p.source === 'Panel wave 3')).toMatchObject({ yes: 705, sampleSize: 1500, groupBias: 'unknown', biasFactor: null });
  });

  it.each([
    [{ ...POLLS[0], share: 0.4 }, 'share'],
    [{ ...POLLS[0], yes: 1001 }, 'yes'],
    [{ ...POLLS[0], fieldEnd: '2026-11-17' }, 'fieldEnd'],
    [{ ...POLLS[0], groupBias: 'known' }, 'biasFactor'],
    [{ ...POLLS[0], biasFactor: 0.6 }, 'biasFactor'],
    [{ ...POLLS[0], methodGroup: 'This project (weighted)' }, 'methodGroup'],
    [{ ...POLLS[0], sampleSize: 0 }, 'sampleSize'],
    [{ ...POLLS[0], colour: 'red' }, 'colour'],
  ])('refuses bad input with 400 and changes nothing (%#)', async (body, field) => {
    const res = await lead.post(`${base}/benchmarks`, body);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain(field);
    expect((await lead.get(`${base}/benchmarks`)).body.polls).toHaveLength(3);
  });

  it('lets only the lead change polls; clients and supervisors read the reconciliation', async () => {
    const supervisor = await client(h, org, 'supervisor');
    const customer = await client(h, org, 'client');
    expect((await supervisor.post(`${base}/benchmarks`, POLLS[0]!)).status).toBe(403);
    expect((await customer.get(`${base}/benchmarks`)).status).toBe(403);
    expect((await supervisor.get(`${base}/reconciliation`)).status).toBe(200);
    expect((await customer.get(`${base}/reconciliation`)).status).toBe(200);
    expect((await (await client(h, org, 'interviewer')).get(`${base}/reconciliation`)).status).toBe(403);
  });

  it('gives the same numbers as `plumbline reconcile` on the same polls', async () => {
    const res = await lead.get(`${base}/reconciliation`);
    expect(res.status).toBe(200);
    const rec = res.body;
    expect(rec.polls).toHaveLength(4);
    // The project's own figure enters with the effective size of its estimate, n* = w(1−w)/SE².
    const { outcome } = (await lead.get(`${base}/balance`)).body;
    const own = rec.polls.find((p: { own: boolean }) => p.own);
    expect(own.trials).toBe(Math.round((outcome.weighted * (1 - outcome.weighted)) / outcome.standardError ** 2));
    expect(own.trials).toBeLessThan(400);
    expect(own.successes).toBe(Math.round(outcome.weighted * own.trials));

    const input = {
      groups: rec.groups.map((g: { name: string; bias: object }) => ({ id: g.name, bias: g.bias })),
      polls: rec.polls.map((p: { id: string; methodGroup: string; successes: number; trials: number }) => ({ id: p.id, group: p.methodGroup, successes: p.successes, trials: p.trials })),
    };
    const dir = mkdtempSync(join(tmpdir(), 'plumbline-reconcile-'));
    writeFileSync(join(dir, 'polls.json'), JSON.stringify(input));
    const cli = JSON.parse(execFileSync(process.execPath, ['--import', 'tsx', resolve(import.meta.dirname, '../src/cli/main.ts'), 'reconcile', '--input', join(dir, 'polls.json')], { encoding: 'utf8' }));
    expect(rec.truth).toEqual(cli.truth);
    expect(rec.groups.map((g: { name: string; meanFactor: number; lower: number; upper: number; probOverstates: number; probUnderstates: number }) =>
      ({ id: g.name, meanFactor: g.meanFactor, lower: g.lower, upper: g.upper, probOverstates: g.probOverstates, probUnderstates: g.probUnderstates }))).toEqual(cli.groups);
    expect(rec.polls.map((p: { id: string; chanceOutlierProbability: number }) => ({ id: p.id, chanceOutlierProbability: p.chanceOutlierProbability }))).toEqual(cli.polls);
    expect(rec.cautions.join(' ')).toMatch(/only as good as the assumption/);
  });

  it('keeps the spread prior per project and uses it', async () => {
    const before = (await lead.get(`${base}/reconciliation`)).body;
    expect(before.spread).toBe(0.04);
    expect((await lead.put(`${base}/reconciliation/settings`, { spread: 0.5 })).status).toBe(400);
    const after = await lead.put(`${base}/reconciliation/settings`, { spread: 0.08 });
    expect(after.status).toBe(200);
    expect(after.body.spread).toBe(0.08);
    expect(after.body.groups.find((g: { name: string }) => g.name === 'Online panel').bias).toEqual({ kind: 'unknown', mean: 0.5, spread: 0.08 });
    // A wider prior on the panel's bias widens its interval.
    const width = (r: typeof before) => { const g = r.groups.find((x: { name: string }) => x.name === 'Online panel'); return g.upper - g.lower; };
    expect(width(after.body)).toBeGreaterThan(width(before));
    expect((await lead.get(`${base}/reconciliation`)).body.spread).toBe(0.08);
  });

  it('edits and deletes a poll, dropping a group left empty', async () => {
    const { polls } = (await lead.get(`${base}/benchmarks`)).body;
    const phone = polls.find((p: { methodGroup: string }) => p.methodGroup === 'Phone');
    const edited = await lead.put(`${base}/benchmarks/${phone.id}`, { ...POLLS[0], groupBias: 'known', biasFactor: 0.45 });
    expect(edited.body).toMatchObject({ groupBias: 'known', biasFactor: 0.45 });
    expect((await lead.put(`${base}/benchmarks/${randomUUID()}`, POLLS[0]!)).status).toBe(404);
    const gone = await h.http().delete(`${base}/benchmarks/${phone.id}`).set({ Authorization: `Bearer ${lead.token}` });
    expect(gone.status).toBe(204);
    const rec = (await lead.get(`${base}/reconciliation`)).body;
    expect(rec.groups.map((g: { name: string }) => g.name).sort()).toEqual(['Online panel', 'This project (weighted)']);
    expect(rec.cautions.join(' ')).toMatch(/No method group is marked as unbiased/);
  });

  it('refuses changes to an archived project with 409', async () => {
    await lead.patch(base, { status: 'closed' });
    expect((await lead.post(`${base}/archive`)).status).toBeLessThan(300);
    const res = await lead.post(`${base}/benchmarks`, POLLS[0]!);
    expect(res.status).toBe(409);
    expect((await lead.put(`${base}/reconciliation/settings`, { spread: 0.05 })).status).toBe(409);
    expect((await lead.get(`${base}/benchmarks`)).body.polls).toHaveLength(2);
  });
});
