import { describe, expect, it } from 'vitest';
import { impliedBiasFactor } from './bias-factor.js';
import { jackknifeBiasFactor } from './bias-factor-jackknife.js';
import { linearisedShare } from './linearised-share.js';
import { rake } from './raking.js';
import { summariseWeighting, type OutcomeRakingCell } from './weighting-summary.js';

// Six cells of a 3 × 2 design, 17 yes of 160; with and without base weights of 2 on two cells.
const CELLS: [string, string, number, number, number][] = [
  ['1', '1', 30, 4, 1], ['1', '2', 22, 1, 2], ['2', '1', 25, 2, 1], ['2', '2', 35, 5, 1], ['3', '1', 18, 3, 2], ['3', '2', 30, 2, 1],
];
const TARGETS = [
  { variable: 'a', shares: [{ category: '1', share: 0.3 }, { category: '2', share: 0.4 }, { category: '3', share: 0.3 }] },
  { variable: 'b', shares: [{ category: '1', share: 0.48 }, { category: '2', share: 0.52 }] },
];
const OPTIONS = { tolerance: 1e-13, maxIterations: 2000 };
const cellsOf = (baseWeights: boolean): OutcomeRakingCell[] =>
  CELLS.map(([a, b, count, successes, bw]) => ({ categories: { a, b }, count, successes, baseWeight: baseWeights ? bw : 1 }));

// Values from R survey 4.1.1, computed once (test/reference/bias-factor-r-survey.spec.ts runs
// the same comparison live): b = plogis(qlogis(u) − qlogis(w)) on calibrate(calfun = "raking");
// the delta-method SE of logit(b) from R's calibration influence (svymean(influence = TRUE)
// projected on cal$postStrata[[1]]$qr) joined with (y − u)/n; the jackknife SE from
// withReplicates on calibrate(as.svrepdesign(type = "JK1")); SE(svymean(~y, cal)).
const R = {
  equal: { factor: 0.496453586705393801, delta: 0.025332321321500283, jackknife: 0.025190279645039788, share: 0.024752607191495392 },
  based: { factor: 0.494827693836199012, delta: 0.077509949755389593, jackknife: 0.082794844058474107, share: 0.025782183084272273 },
};

function delta(cells: OutcomeRakingCell[]) {
  const weights = rake(cells, TARGETS, OPTIONS).weights;
  const share = linearisedShare(cells.map((c, j) => ({
    levels: [Number(c.categories.a) - 1, Number(c.categories.b) - 1], count: c.count, successes: c.successes,
    baseWeight: c.baseWeight ?? 1, weight: weights[j] as number,
  })));
  return { share, bias: impliedBiasFactor(cells, share) };
}

describe.each([['equal', false], ['based', true]] as const)('implied bias factor interval, base weights %s (values from R survey 4.1.1)', (name, baseWeights) => {
  const reference = R[name];

  it('delta method: logit(b)\'s standard error takes the share\'s influence through the raking', () => {
    const { share, bias } = delta(cellsOf(baseWeights));
    expect(bias.factor).toBeCloseTo(reference.factor, 9);
    expect(Math.abs((bias.standardError as number) / reference.delta - 1)).toBeLessThan(1e-6);
    expect(Math.abs(share.standardError / reference.share - 1)).toBeLessThan(1e-6);
  });

  it('delete-one jackknife on the aggregated cells equals JK1 with every replicate re-raked', () => {
    const bias = jackknifeBiasFactor(cellsOf(baseWeights), TARGETS, OPTIONS);
    expect(bias.factor).toBeCloseTo(reference.factor, 9);
    expect(Math.abs((bias.standardError as number) / reference.jackknife - 1)).toBeLessThan(1e-6);
    const z = 1.959963984540054;
    const logit = (p: number) => Math.log(p / (1 - p));
    expect(logit(bias.upper as number) - logit(bias.factor as number)).toBeCloseTo(z * reference.jackknife, 6);
  });
});

describe('choosing the bias factor\'s interval', () => {
  it('a sample already on its targets still has an interval of real width (its mix is random too)', () => {
    // Sample margins equal the targets, so every weight is 1 and u = w: b = 0.5 exactly.
    const cells = [['f', 'y', 150, 60], ['f', 'o', 150, 90], ['m', 'y', 150, 45], ['m', 'o', 150, 75]]
      .map(([sex, age, count, successes]) => ({ categories: { sex: sex as string, age: age as string }, count: count as number, successes: successes as number }));
    const targets = [
      { variable: 'sex', shares: [{ category: 'f', share: 0.5 }, { category: 'm', share: 0.5 }] },
      { variable: 'age', shares: [{ category: 'y', share: 0.5 }, { category: 'o', share: 0.5 }] },
    ];
    const outcome = summariseWeighting(cells, targets).outcome!;
    expect(outcome.impliedBiasFactor).toBeCloseTo(0.5, 12);
    expect(outcome.impliedBiasFactorMethod).toMatch(/^delta method/);
    const [lower, upper] = outcome.impliedBiasFactorInterval as [number, number];
    // Treating the weights as fixed gave an interval of zero width here, so any sample drifting
    // by chance looked biased; the mix's own randomness gives about ±0.009 at 600 interviews.
    expect(upper - lower).toBeGreaterThan(0.015);
    expect(lower).toBeLessThan(0.5);
    expect(upper).toBeGreaterThan(0.5);
  });

  it('takes the jackknife below 100 interviews of the less common answer and the delta method from 100', () => {
    const cells = (yes: number) => [
      { categories: { s: 'f' }, count: 300, successes: Math.ceil(yes / 2) }, { categories: { s: 'm' }, count: 200, successes: Math.floor(yes / 2) },
    ];
    const targets = [{ variable: 's', shares: [{ category: 'f', share: 0.5 }, { category: 'm', share: 0.5 }] }];
    expect(summariseWeighting(cells(99), targets).outcome!.impliedBiasFactorMethod).toMatch(/jackknife/);
    expect(summariseWeighting(cells(100), targets).outcome!.impliedBiasFactorMethod).toMatch(/^delta method/);
    expect(summariseWeighting(cells(401), targets).outcome!.impliedBiasFactorMethod).toMatch(/jackknife/);
  });
});
