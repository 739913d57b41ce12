import { describe, expect, it } from 'vitest';
import { EstimationInputError } from './errors.js';
import { linearisedShare } from './linearised-share.js';
import { kornGraubardInterval, symmetricHalfWidth } from './share-interval.js';
import { summariseWeighting } from './weighting-summary.js';

// Eight cells of a 2 × 3 design, two of them with base weight 2.5 (the rest 1).
const CELLS = [
  ['1', '1', 30, 9, 1], ['1', '2', 45, 10, 1], ['1', '3', 25, 3, 1], ['2', '1', 50, 20, 1],
  ['2', '2', 20, 4, 1], ['2', '3', 30, 6, 1], ['1', '1', 10, 5, 2.5], ['2', '3', 15, 2, 2.5],
].map(([a, b, count, successes, baseWeight]) => ({
  categories: { a: a as string, b: b as string }, count: count as number, successes: successes as number, baseWeight: baseWeight as number,
}));
const TARGETS = [
  { variable: 'a', shares: [{ category: '1', share: 0.45 }, { category: '2', share: 0.55 }] },
  { variable: 'b', shares: [{ category: '1', share: 0.45 }, { category: '2', share: 0.3 }, { category: '3', share: 0.25 }] },
];
// Values from R survey 4.1 calibrate(~a + b, calfun = "raking", epsilon = 1e-12) + svymean(~y)
// and svyciprop(~y, method = "beta") on the same interviews, computed once.
const R_SHARE = 0.280720241416448468;
const R_STANDARD_ERROR = 0.031487552461010981;
const R_INTERVAL = [0.220157865217846749, 0.347789604540408193];

describe('standard error of the weighted share, linearised through the raking', () => {
  const summary = summariseWeighting(CELLS, TARGETS, { tolerance: 1e-13, maxIterations: 1000 });
  const outcome = summary.outcome!;

  it('equals survey::calibrate + svymean on the same cells (value from R survey 4.1, computed once)', () => {
    expect(outcome.weighted).toBeCloseTo(R_SHARE, 9);
    expect(Math.abs((outcome.standardError as number) / R_STANDARD_ERROR - 1)).toBeLessThan(1e-6);
  });

  it('gives the Korn–Graubard interval of svyciprop(method = "beta") (value from R survey 4.1, computed once)', () => {
    const [lower, upper] = outcome.interval as [number, number];
    expect(Math.abs(lower / (R_INTERVAL[0] as number) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(upper / (R_INTERVAL[1] as number) - 1)).toBeLessThan(1e-6);
  });

  it('reports marginOfError as 1.96 standard errors and keeps Kish\'s figures as the cost of weighting', () => {
    expect(outcome.marginOfError).toBeCloseTo(1.96 * (outcome.standardError as number), 12);
    expect(outcome.method).toMatch(/linearised.*Korn and Graubard/);
    expect(summary.designEffect).toBeGreaterThan(1);
    expect(summary.effectiveSampleSize).toBeCloseTo(summary.n / summary.designEffect, 9);
  });

  it('does not depend on how the same interviews are split into cells', () => {
    const split = CELLS.flatMap((c) => [{ ...c, count: c.count - 3, successes: Math.max(0, c.successes - 1) },
      { ...c, count: 3, successes: Math.min(1, c.successes) }]);
    const again = summariseWeighting(split, TARGETS, { tolerance: 1e-13, maxIterations: 1000 }).outcome!;
    expect(again.standardError).toBeCloseTo(outcome.standardError as number, 12);
  });

  it('rejects cells it cannot use, with a clear error', () => {
    const cell = { levels: [0], count: 2, successes: 3, baseWeight: 1, weight: 1 };
    expect(() => linearisedShare([cell])).toThrow(EstimationInputError);
    expect(() => linearisedShare([{ ...cell, successes: 1, baseWeight: 0 }])).toThrow(/base weight/);
  });
});

describe('Korn–Graubard interval of a share', () => {
  it('is Clopper–Pearson on n* = w(1−w)/SE² (value from R survey 4.1 svyciprop, computed once)', () => {
    const { lower, upper } = kornGraubardInterval(R_SHARE, R_STANDARD_ERROR, 100);
    expect(Math.abs(lower / (R_INTERVAL[0] as number) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(upper / (R_INTERVAL[1] as number) - 1)).toBeLessThan(1e-6);
  });

  it('falls back to Kish\'s effective sample size at a share of 0: upper = 1 − 0.025^(1/n) (Clopper and Pearson 1934)', () => {
    const { lower, upper, effectiveSampleSize } = kornGraubardInterval(0, 0, 80);
    expect(lower).toBe(0);
    expect(effectiveSampleSize).toBe(80);
    expect(upper).toBeCloseTo(1 - 0.025 ** (1 / 80), 9);
    expect(kornGraubardInterval(1, 0, 80).lower).toBeCloseTo(0.025 ** (1 / 80), 9);
  });

  it('shows a ± figure only when the two half-widths are within 10% of each other', () => {
    expect(symmetricHalfWidth(0.5, 0.45, 0.55)).toBeCloseTo(0.05, 12);
    expect(symmetricHalfWidth(0.5, 0.454, 0.55)).toBeCloseTo(0.048, 12);
    expect(symmetricHalfWidth(0.5, 0.456, 0.55)).toBeNull();
    expect(symmetricHalfWidth(0.04, 0.02, 0.07)).toBeNull();
    expect(symmetricHalfWidth(0, 0, 0.04)).toBeNull();
  });

  it('rejects a share outside [0, 1] or a negative standard error', () => {
    expect(() => kornGraubardInterval(1.2, 0.1, 10)).toThrow(EstimationInputError);
    expect(() => kornGraubardInterval(0.2, -0.1, 10)).toThrow(/standard error/);
  });
});
