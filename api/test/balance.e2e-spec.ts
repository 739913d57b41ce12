import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { drawRespondent, seeded, VELLMOOR_TARGETS } from '../src/demo/vellmoor.js';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { client, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let lead: Awaited<ReturnType<typeof client>>;
let base: string;

const VELLMOOR = {
  variables: Object.entries(VELLMOOR_TARGETS).map(([name, shares]) => ({
    name,
    interlocked: name === 'age_band' || name === 'sex',
    categories: Object.entries(shares).map(([label, share]) => ({ label, share })),
  })),
};

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Balance');
  lead = await client(h, org, 'lead');
  base = `/api/projects/${org.projectId}`;
  await lead.patch(base, { targetSize: 1200, headlineQuestion: 'Do you support the extension?' });
  await lead.put(`${base}/targets`, VELLMOOR);
});
afterAll(() => h.close());

async function logInterviews(count: number, seed: number) {
  const targets: Targets = (await lead.get(`${base}/targets`)).body;
  const random = seeded(seed);
  const interviewer = await client(h, org, 'interviewer');
  const batch = Array.from({ length: count }, (_, i) => {
    const r = drawRespondent(random);
    const categories: Record<string, string> = {};
    for (const v of targets.variables) categories[v.id] = v.categories.find((c) => c.label === r.categories[v.name])!.id;
    const at = new Date(Date.UTC(2026, 10, 16 + (i % 10), 10)).toISOString();
    // Every 7th says don't know and every 23rd gives no answer: raked, but outside the share.
    const headlineAnswer = i % 7 === 3 ? 'dont_know' : i % 23 === 5 ? 'no_answer' : r.supports ? 'yes' : 'no';
    return { id: randomUUID(), disposition: 'complete', categories, headlineAnswer, startedAt: at, endedAt: at };
  });
  const res = await interviewer.post(`${base}/interviews/sync`, { interviews: batch });
  expect(res.body.accepted).toBe(count);
}

describe('live balance', () => {
  it('says why no weights exist before every category has an interview', async () => {
    const res = await lead.get(`${base}/balance`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ n: 0, designEffect: null, outcome: null });
    expect(res.body.weightingProblem).toBe('Weights need at least two completed interviews.');
  });

  it('agrees with `plumbline weight` on an export of the same interviews', async () => {
    await logInterviews(400, 7);
    const balance = (await lead.get(`${base}/balance`)).body;
    expect(balance.weightingProblem).toBeNull();
    expect(balance.n).toBe(400);

    const dir = mkdtempSync(join(tmpdir(), 'plumbline-balance-'));
    const exported = await lead.get(`${base}/interviews/export.csv`);
    expect(exported.status).toBe(200);
    expect(exported.headers['content-type']).toMatch(/^text\/csv/);
    writeFileSync(join(dir, 'data.csv'), exported.text);
    const targets: { variables: { columnName: string; categories: { label: string; share: number }[] }[] } = (await lead.get(`${base}/targets`)).body;
    const targetsCsv = ['variable,category,share', ...targets.variables.flatMap((v) => v.categories.map((c) => `${v.columnName},${c.label},${c.share}`))].join('\n');
    writeFileSync(join(dir, 'targets.csv'), `${targetsCsv}\n`);
    // The source under test, not a build that may be older than it.
    const source = resolve(import.meta.dirname, '../src/cli/main.ts');
    const stdout = execFileSync(process.execPath, ['--import', 'tsx', source, 'weight', '--data', join(dir, 'data.csv'), '--targets', join(dir, 'targets.csv'), '--out', join(dir, 'weighted.csv'), '--outcome', 'headline'], { encoding: 'utf8' });
    const cli = JSON.parse(stdout);
    expect(readFileSync(join(dir, 'weighted.csv'), 'utf8').trim().split('\n')).toHaveLength(401);
    expect(balance.designEffect).toBeCloseTo(cli.designEffect, 9);
    expect(balance.effectiveSampleSize).toBeCloseTo(cli.effectiveSampleSize, 6);
    expect(balance.outcome.weighted).toBeCloseTo(cli.outcome.weighted, 9);
    expect(balance.outcome.unweighted).toBeCloseTo(cli.outcome.unweighted, 12);
    expect(balance.outcome.impliedBiasFactor).toBeCloseTo(cli.outcome.impliedBiasFactor, 9);
    // The same linearised standard error and Korn–Graubard interval of the weighted share.
    expect(balance.outcome.standardError).toBeCloseTo(cli.outcome.standardError, 9);
    expect(balance.outcome.interval[0]).toBeCloseTo(cli.outcome.interval[0], 9);
    expect(balance.outcome.interval[1]).toBeCloseTo(cli.outcome.interval[1], 9);
    expect(balance.outcome.method).toBe(cli.outcome.method);
    // The share is over those who answered yes or no; the other answers are reported beside it.
    const headlineAt = exported.text.split('\n')[0]!.split(',').indexOf('headline');
    const answers: string[] = exported.text.trim().split('\n').slice(1).map((l: string) => l.split(',')[headlineAt] ?? '');
    expect(balance.outcome.answered).toBe(answers.filter((a) => a === 'yes' || a === 'no').length);
    expect(balance.outcome.answered).toBeLessThan(400);
    expect(balance.outcome.unweighted).toBeCloseTo(answers.filter((a) => a === 'yes').length / balance.outcome.answered, 12);
    balance.outcome.otherAnswers.forEach((o: { weighted: number }, i: number) => expect(o.weighted).toBeCloseTo(cli.outcome.otherAnswers[i].weighted, 9));
    expect(balance.outcome.otherAnswers.map((o: { answer: string; count: number }) => [o.answer, o.count]))
      .toEqual([['dont_know', answers.filter((a) => a === 'dont_know').length], ['no_answer', answers.filter((a) => a === 'no_answer').length]]);
    expect(balance.outcome.marginOfError).toBeCloseTo(1.96 * balance.outcome.standardError, 12);
    // The bias factor is defined as odds(u) / (odds(u) + odds(w)) (docs/methods.md, section 6).
    const odds = (p: number) => p / (1 - p);
    const { unweighted: u, weighted: w } = balance.outcome;
    expect(balance.outcome.impliedBiasFactor).toBeCloseTo(odds(u) / (odds(u) + odds(w)), 12);
    const [lo, hi] = balance.outcome.impliedBiasFactorInterval;
    expect(lo).toBeLessThan(balance.outcome.impliedBiasFactor);
    expect(hi).toBeGreaterThan(balance.outcome.impliedBiasFactor);
  });

  it('reports sample shares that match a count of the export, and weighted shares on target', async () => {
    const balance = (await lead.get(`${base}/balance`)).body;
    const rows = (await lead.get(`${base}/interviews/export.csv`)).text.trim().split('\n').slice(1).map((l: string) => l.split(','));
    const header = (await lead.get(`${base}/interviews/export.csv`)).text.split('\n')[0]!.split(',');
    const col = header.indexOf('region');
    const harrowby = balance.margins.find((m: { variable: string; category: string }) => m.variable === 'region' && m.category === 'Harrowby');
    expect(harrowby.unweighted).toBeCloseTo(rows.filter((r: string[]) => r[col] === 'Harrowby').length / rows.length, 12);
    expect(harrowby.target).toBeCloseTo(0.28, 12);
    expect(Math.abs(harrowby.weighted - harrowby.target)).toBeLessThan(1e-6);
  });

  it('leaves interviews rejected on review out of the balance and the cell counts', async () => {
    const before = (await lead.get(`${base}/balance`)).body;
    const cellsBefore = (await lead.get(`${base}/cells`)).body.cells;
    const ids = (await h.db('interviews').where({ project_id: org.projectId }).orderBy('id').limit(10).select('id')).map((r) => r.id);
    await h.db('interviews').whereIn('id', ids).update({ review_status: 'rejected' });
    const after = (await lead.get(`${base}/balance`)).body;
    const cellsAfter = (await lead.get(`${base}/cells`)).body.cells;
    await h.db('interviews').whereIn('id', ids).update({ review_status: 'pending' });
    expect(after.n).toBe(before.n - 10);
    const sum = (cells: { kind: string; achieved: number }[]) => cells.filter((c) => c.kind === 'interlocked').reduce((s, c) => s + c.achieved, 0);
    expect(sum(cellsAfter)).toBe(sum(cellsBefore) - 10);
    expect((await lead.get(`${base}/balance`)).body.n).toBe(before.n);
  });

  it('rakes to joint age band × sex shares when the lead gives them, and to the margins while a joint cell is empty', async () => {
    const joint: [string, number, number][] = [['18-24', 5.4, 5.6], ['25-34', 8.4, 8.6], ['35-44', 8, 8], ['45-54', 8.5, 8.5], ['55-64', 8.1, 7.9], ['65+', 12.6, 10.4]];
    const jointShares = joint.flatMap(([age, female, male]) => [{ categories: [age, 'female'], share: female }, { categories: [age, 'male'], share: male }]);
    expect((await lead.put(`${base}/targets`, { ...VELLMOOR, jointShares })).status).toBe(200);
    const balance = (await lead.get(`${base}/balance`)).body;
    expect(balance.withheld).toEqual([]);
    const cell = balance.margins.find((m: { variable: string; category: string }) => m.variable === 'age_band × sex' && m.category === '65+ × male');
    expect(cell.target).toBeCloseTo(0.104, 12);
    expect(Math.abs(cell.weighted - 0.104)).toBeLessThan(1e-6);
    const female = balance.margins.find((m: { variable: string; category: string }) => m.variable === 'sex' && m.category === 'female');
    expect(Math.abs(female.weighted - 0.51)).toBeLessThan(1e-6);

    // No counted interview left among young men: weighting falls back to the margins and says why.
    const young = (await lead.get(`${base}/targets`)).body.variables.flatMap((v: { categories: { id: string; label: string }[] }) => v.categories)
      .filter((c: { label: string }) => c.label === '18-24' || c.label === 'male').map((c: { id: string }) => c.id);
    const ids = (await h.db('interviews').where({ project_id: org.projectId }).whereRaw('category_ids @> ?::uuid[]', [young]).select('id')).map((r) => r.id);
    expect(ids.length).toBeGreaterThan(0);
    await h.db('interviews').whereIn('id', ids).update({ review_status: 'rejected' });
    const fallback = (await lead.get(`${base}/balance`)).body;
    await h.db('interviews').whereIn('id', ids).update({ review_status: 'pending' });
    await lead.put(`${base}/targets`, VELLMOOR);
    expect(fallback.weightingProblem).toBeNull();
    expect(fallback.margins.some((m: { variable: string }) => m.variable === 'age_band × sex')).toBe(false);
    expect(fallback.withheld[0].reason).toContain('the interlocked cell age_band: 18-24 × sex: male has a target but no interviews');
  });

  it('is read-only for clients and hidden from interviewers', async () => {
    const c = await client(h, org, 'client');
    expect((await c.get(`${base}/balance`)).status).toBe(200);
    expect((await c.get(`${base}/interviews/export.csv`)).status).toBe(403);
    const i = await client(h, org, 'interviewer');
    expect((await i.get(`${base}/balance`)).status).toBe(403);
  });
});
