import { describe, expect, it } from 'vitest';
import { impliedBiasFactor } from './bias-factor.js';
import { jackknifeBiasFactor } from './bias-factor-jackknife.js';
import { EstimationInputError } from './errors.js';
import { linearisedShare } from './linearised-share.js';
import { summariseWeighting } from './weighting-summary.js';

// The headline share over those who answered yes or no, with every complete raked
// (docs/methods.md, section 2). Eight cells of a 2 × 3 design, two with base weight 2.5;
// per cell: interviews, yes, yes or no (the rest said don't know or gave no answer).
const CELLS = [
  ['1', '1', 30, 9, 26, 1], ['1', '2', 45, 10, 40, 1], ['1', '3', 25, 3, 18, 1], ['2', '1', 50, 20, 44, 1],
  ['2', '2', 20, 4, 17, 1], ['2', '3', 30, 6, 24, 1], ['1', '1', 10, 5, 9, 2.5], ['2', '3', 15, 2, 12, 2.5],
].map(([a, b, count, successes, answered, baseWeight]) => ({
  categories: { a: a as string, b: b as string }, count: count as number, successes: successes as number,
  answered: answered as number, dontKnow: Math.ceil(((count as number) - (answered as number)) / 2), baseWeight: baseWeight as number,
}));
const TARGETS = [
  { variable: 'a', shares: [{ category: '1', share: 0.45 }, { category: '2', share: 0.55 }] },
  { variable: 'b', shares: [{ category: '1', share: 0.45 }, { category: '2', share: 0.3 }, { category: '3', share: 0.25 }] },
];
// Values from R survey 4.1, computed once on the same interviews (one row each):
// calibrate(svydesign(ids = ~1, weights = ~base), ~a + b, calfun = "raking", epsilon = 1e-12),
// then svyratio(~yes, ~answered, cal) and svyciprop(~yes, subset(cal, answered == 1), method = "beta").
const R_RATIO = 0.3285817634473546245;
const R_STANDARD_ERROR = 0.0356668667931215044;
const R_INTERVAL = [0.2592115736742000576, 0.4039406083288271665];

const relative = (x: number, r: number) => Math.abs(x / r - 1);

describe('headline share as a ratio over those who answered, linearised through the raking', () => {
  const summary = summariseWeighting(CELLS, TARGETS, { tolerance: 1e-13, maxIterations: 1000 });
  const outcome = summary.outcome!;

  it('equals svyratio(~yes, ~answered) on the calibrated design (values from R survey 4.1, computed once)', () => {
    expect(relative(outcome.weighted, R_RATIO)).toBeLessThan(1e-9);
    expect(relative(outcome.standardError as number, R_STANDARD_ERROR)).toBeLessThan(1e-6);
  });

  it('gives svyciprop(method = "beta") on the answered domain (values from R survey 4.1, computed once)', () => {
    const [lower, upper] = outcome.interval as [number, number];
    expect(relative(lower, R_INTERVAL[0] as number)).toBeLessThan(1e-6);
    expect(relative(upper, R_INTERVAL[1] as number)).toBeLessThan(1e-6);
  });

  it('rakes every complete, counts the share over those who answered and reports the other answers beside it', () => {
    expect(summary.n).toBe(225);
    expect(outcome.answered).toBe(190);
    expect(outcome.unweighted).toBeCloseTo(59 / 190, 12);
    const [dontKnow, noAnswer] = outcome.otherAnswers;
    expect(dontKnow).toMatchObject({ answer: 'dont_know', count: 20 });
    expect(noAnswer).toMatchObject({ answer: 'no_answer', count: 15 });
    // The weighted shares of yes-or-no, don't know and no answer make up every complete.
    const answeredWeighted = CELLS.reduce((s, c, j) => s + c.answered * (summary.weights[j] as number), 0) / summary.n;
    expect(answeredWeighted + dontKnow!.weighted + noAnswer!.weighted).toBeCloseTo(1, 12);
  });

  it('takes the implied bias factor over those who answered, by the delta method and the jackknife alike', () => {
    const delta = impliedBiasFactor(CELLS, linearisedShare(CELLS.map((c, j) => ({
      levels: [Number(c.categories.a) - 1, Number(c.categories.b) - 1], count: c.count, successes: c.successes,
      answered: c.answered, baseWeight: c.baseWeight, weight: summary.weights[j] as number,
    }))));
    expect(delta.unweighted).toBeCloseTo(59 / 190, 12);
    expect(delta.weighted).toBeCloseTo(outcome.weighted, 9);
    const jackknife = jackknifeBiasFactor(CELLS, TARGETS, { tolerance: 1e-13, maxIterations: 1000 });
    expect(jackknife.factor).toBeCloseTo(delta.factor as number, 9);
    // Two estimates of one standard error on 225 interviews: within a tenth of each other.
    expect(relative(jackknife.standardError as number, delta.standardError as number)).toBeLessThan(0.1);
  });

  it('is the plain weighted share when everyone answered', () => {
    const all = CELLS.map((c) => ({ ...c, answered: c.count, dontKnow: 0 }));
    const plain = CELLS.map(({ answered: _a, dontKnow: _d, ...c }) => c);
    const a = summariseWeighting(all, TARGETS, { tolerance: 1e-13 }).outcome!;
    const b = summariseWeighting(plain, TARGETS, { tolerance: 1e-13 }).outcome!;
    expect(a.standardError).toBeCloseTo(b.standardError as number, 14);
    expect(a.interval).toEqual(b.interval);
  });

  it('refuses cells whose answers do not add up, and gives no share when nobody answered yes or no', () => {
    const cell = { levels: [0], count: 4, successes: 2, answered: 5, baseWeight: 1, weight: 1 };
    expect(() => linearisedShare([cell])).toThrow(EstimationInputError);
    expect(() => linearisedShare([{ ...cell, answered: 1 }])).toThrow(/successes/);
    expect(() => linearisedShare([{ ...cell, successes: 0, answered: 0 }])).toThrow(/nobody answered yes or no/);
    const silent = CELLS.map((c) => ({ ...c, successes: 0, answered: 0 }));
    expect(summariseWeighting(silent, TARGETS).outcome).toBeUndefined();
  });
});
