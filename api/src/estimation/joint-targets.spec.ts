import { describe, expect, it } from 'vitest';
import { EstimationInputError } from './errors.js';
import { resolveTargets } from './joint-targets.js';
import { allocateQuotas } from './quotas.js';
import type { MarginTarget } from './raking.js';
import { summariseWeighting, type OutcomeRakingCell } from './weighting-summary.js';

// Twelve cells: age (3) × sex (2) × region (2), 250 interviews; joint age × sex shares as a
// census table gives them, and a region margin.
const CELLS: [string, string, string, number, number][] = [
  ['18-34', 'f', 'n', 20, 12], ['18-34', 'f', 's', 14, 6], ['18-34', 'm', 'n', 11, 4], ['18-34', 'm', 's', 9, 5],
  ['35-54', 'f', 'n', 30, 14], ['35-54', 'f', 's', 22, 9], ['35-54', 'm', 'n', 18, 7], ['35-54', 'm', 's', 15, 8],
  ['55+', 'f', 'n', 40, 13], ['55+', 'f', 's', 31, 12], ['55+', 'm', 'n', 22, 6], ['55+', 'm', 's', 18, 5],
];
const cells: OutcomeRakingCell[] = CELLS.map(([age, sex, region, count, successes]) => ({ categories: { age, sex, region }, count, successes }));
const JOINT: MarginTarget = {
  variable: 'age × sex',
  shares: [['18-34 × f', 0.14], ['18-34 × m', 0.15], ['35-54 × f', 0.17], ['35-54 × m', 0.16], ['55+ × f', 0.21], ['55+ × m', 0.17]]
    .map(([category, share]) => ({ category: category as string, share: share as number })),
};
const REGION: MarginTarget = { variable: 'region', shares: [{ category: 'n', share: 0.55 }, { category: 's', share: 0.45 }] };
const margin = (variable: string, entries: [string, number][]): MarginTarget => ({ variable, shares: entries.map(([category, share]) => ({ category, share })) });

// Values from R survey 4.1.1, computed once: calibrate(~agesex + region, calfun = "raking",
// epsilon = 1e-12) with agesex = paste(age, sex) and the joint shares as population totals;
// svymean(~y), svyciprop(~y, method = "beta"), weights(cal) / mean(weights(cal)).
const R = {
  share: 0.41062434331140002, standardError: 0.032269183529971601, interval: [0.346730666746889515, 0.476827998463118852],
  weightYoungMenNorth: 1.833810971493837316, weightOlderWomenSouth: 0.759786137645964144, designEffect: 1.094798665826971051,
};

describe('weighting to joint targets of interlocked variables', () => {
  const summary = summariseWeighting(cells, [JOINT, REGION], { tolerance: 1e-13, maxIterations: 2000 });

  it('rakes to the age × sex table as one variable: weights, share, standard error and interval as R (values from R survey 4.1.1)', () => {
    expect(summary.converged).toBe(true);
    expect(summary.weights[2]).toBeCloseTo(R.weightYoungMenNorth, 9);
    expect(summary.weights[9]).toBeCloseTo(R.weightOlderWomenSouth, 9);
    expect(summary.designEffect).toBeCloseTo(R.designEffect, 9);
    expect(summary.outcome!.weighted).toBeCloseTo(R.share, 9);
    expect(Math.abs((summary.outcome!.standardError as number) / R.standardError - 1)).toBeLessThan(1e-6);
    expect(Math.abs((summary.outcome!.interval as number[])[0]! / R.interval[0]! - 1)).toBeLessThan(1e-6);
    expect(Math.abs((summary.outcome!.interval as number[])[1]! / R.interval[1]! - 1)).toBeLessThan(1e-6);
  });

  it('meets every joint cell, and reports the age and sex margins the table implies', () => {
    const young = summary.margins.find((m) => m.variable === 'age × sex' && m.category === '18-34 × m')!;
    expect(young.weighted).toBeCloseTo(0.15, 9);
    const female = summary.margins.find((m) => m.variable === 'sex' && m.category === 'f')!;
    expect(female.target).toBeCloseTo(0.52, 12);
    expect(female.weighted).toBeCloseTo(0.52, 9);
    expect(summary.margins.filter((m) => m.variable === 'age').map((m) => m.target)).toEqual([0.29, 0.33, 0.38].map((x) => expect.closeTo(x, 12)));
  });

  it('refuses to weight when a joint cell with a target has no interviews, where the margins alone would hide it', () => {
    const noYoungMen = cells.filter((c) => !(c.categories.age === '18-34' && c.categories.sex === 'm'));
    // Margins only: raking converges, and the weighted sample has no young men against a target of 15%.
    const margins = summariseWeighting(noYoungMen, [margin('age', [['18-34', 0.29], ['35-54', 0.33], ['55+', 0.38]]), margin('sex', [['f', 0.52], ['m', 0.48]]), REGION]);
    expect(margins.converged).toBe(true);
    expect(() => summariseWeighting(noYoungMen, [JOINT, REGION])).toThrow(/age × sex: category "18-34 × m" has a target but no respondents/);
  });

  it('takes a margin given as well when it agrees with the table within 0.5 points', () => {
    const close = summariseWeighting(cells, [margin('sex', [['f', 0.524], ['m', 0.476]]), JOINT, REGION], { tolerance: 1e-13, maxIterations: 2000 });
    expect(close.outcome!.weighted).toBeCloseTo(R.share, 9);
  });

  it('refuses a margin that differs from the table by more than 0.5 points, naming both figures', () => {
    expect(() => resolveTargets([margin('sex', [['f', 0.51], ['m', 0.49]]), JOINT])).toThrow(
      'variable sex category "f": its own target is 51.0% but the joint table age × sex gives 52.0%; they differ by more than 0.5 points',
    );
  });

  it('refuses a table with a combination missing or a category not naming every variable', () => {
    const missing = { ...JOINT, shares: JOINT.shares.filter((s) => s.category !== '35-54 × m') };
    expect(() => resolveTargets([missing])).toThrow('variable age × sex: no share for "35-54 × m"; give every combination (0 where there is none)');
    const short = { ...JOINT, shares: [...JOINT.shares, { category: '18-34', share: 0.1 }] };
    expect(() => resolveTargets([short])).toThrow(EstimationInputError);
    expect(() => resolveTargets([short])).toThrow(/category "18-34" must name one category of each of age, sex/);
  });

  it('gives quota cells the joint shares, not the product of the margins', () => {
    const allocation = allocateQuotas([JOINT, REGION], 1000);
    const cross = allocation.sets[0]!;
    expect(cross.variables).toEqual(['age', 'sex']);
    // 15% of 1,000 young men from the table; the product of the margins would give 0.29 × 0.48 = 13.9%.
    expect(cross.cells.find((c) => c.categories.age === '18-34' && c.categories.sex === 'm')!.target).toBe(150);
    expect(allocation.sets[1]!.variables).toEqual(['region']);
  });
});
