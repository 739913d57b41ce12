import { describe, expect, it } from 'vitest';
import { seeded } from '../../api/src/demo/vellmoor.js';
import { summariseWeighting, type OutcomeRakingCell } from '../../api/src/estimation/weighting-summary.js';

/**
 * Seeded simulation of the Korn–Graubard interval (Korn and Graubard 1998) on raked samples:
 * a population of 2 × 3 cells with a 4% share overall, samples drawn with selection odds that
 * multiply across the two variables (so raking to the margins removes the imbalance), raked
 * back to the population margins. Coverage of a nominal 95% interval is expected near 95%;
 * the 93.5–98.5% band allows for simulation error over 4,000 samples (common practice).
 */
const A = [0.4, 0.6];
const B = [0.3, 0.45, 0.25];
const RATE = [[0.07, 0.03, 0.05], [0.05, 0.025, 0.037]];
const SELECT_A = [2, 1];
const SELECT_B = [1, 2.5, 1.2];

const cellsOf = () => A.flatMap((pa, a) => B.map((pb, b) => ({ a, b, share: pa * pb, rate: RATE[a]?.[b] as number,
  pick: pa * pb * (SELECT_A[a] as number) * (SELECT_B[b] as number) })));

describe('coverage of the weighted share\'s interval at a share of 4% (seeded simulation)', () => {
  it('covers the population share in 93.5–98.5% of 4,000 raked samples of 600, reporting the width', () => {
    const population = cellsOf();
    const truth = population.reduce((s, c) => s + c.share * c.rate, 0);
    expect(truth).toBeCloseTo(0.04, 3);
    const pickTotal = population.reduce((s, c) => s + c.pick, 0);
    const targets = [
      { variable: 'a', shares: A.map((share, i) => ({ category: `a${i}`, share })) },
      { variable: 'b', shares: B.map((share, i) => ({ category: `b${i}`, share })) },
    ];
    const random = seeded(2026);
    const samples = 4000;
    let covered = 0;
    let width = 0;
    for (let s = 0; s < samples; s++) {
      const cells: OutcomeRakingCell[] = population.map((c) => ({ categories: { a: `a${c.a}`, b: `b${c.b}` }, count: 0, successes: 0 }));
      for (let i = 0; i < 600; i++) {
        let u = random() * pickTotal;
        let j = 0;
        while (j < population.length - 1 && u >= (population[j]?.pick as number)) u -= population[j++]?.pick as number;
        const cell = cells[j] as OutcomeRakingCell;
        cell.count++;
        if (random() < (population[j]?.rate as number)) cell.successes++;
      }
      const [lower, upper] = summariseWeighting(cells, targets, { tolerance: 1e-10, maxIterations: 500 }).outcome?.interval as [number, number];
      if (lower <= truth && truth <= upper) covered++;
      width += upper - lower;
    }
    const coverage = covered / samples;
    console.log(`Korn–Graubard 95% interval at share ${truth.toFixed(4)}: coverage ${(coverage * 100).toFixed(1)}%, mean width ${(width / samples).toFixed(4)}`);
    expect(coverage).toBeGreaterThanOrEqual(0.935);
    expect(coverage).toBeLessThanOrEqual(0.985);
  });
});

/**
 * The same design for the headline share over those who answered yes or no (docs/methods.md,
 * section 2): about 15% say don't know, more often in some cells than others, and all are
 * raked; the truth is the population's yes share among those who would answer. Korn–Graubard
 * on the ratio's effective size is expected near 95%; 93.5–96.5% over 4,000 samples is about
 * three simulation standard errors either side (common practice).
 */
const YES_AMONG_ANSWERED = [[0.5, 0.35, 0.42], [0.38, 0.3, 0.45]];
const DONT_KNOW = [[0.09, 0.18, 0.11], [0.13, 0.2, 0.11]];

describe('coverage of the headline share\'s interval with 15% don\'t know (seeded simulation)', () => {
  it('covers the population ratio in 93.5–96.5% of 4,000 raked samples of 600', () => {
    const population = cellsOf().map((c) => ({ ...c, yes: YES_AMONG_ANSWERED[c.a]?.[c.b] as number, dk: DONT_KNOW[c.a]?.[c.b] as number }));
    const answering = population.reduce((s, c) => s + c.share * (1 - c.dk), 0);
    const truth = population.reduce((s, c) => s + c.share * (1 - c.dk) * c.yes, 0) / answering;
    expect(1 - answering).toBeCloseTo(0.15, 2);
    const pickTotal = population.reduce((s, c) => s + c.pick, 0);
    const targets = [
      { variable: 'a', shares: A.map((share, i) => ({ category: `a${i}`, share })) },
      { variable: 'b', shares: B.map((share, i) => ({ category: `b${i}`, share })) },
    ];
    const random = seeded(2027);
    const samples = 4000;
    let covered = 0;
    for (let s = 0; s < samples; s++) {
      const cells: OutcomeRakingCell[] = population.map((c) => ({ categories: { a: `a${c.a}`, b: `b${c.b}` }, count: 0, successes: 0, answered: 0 }));
      for (let i = 0; i < 600; i++) {
        let u = random() * pickTotal;
        let j = 0;
        while (j < population.length - 1 && u >= (population[j]?.pick as number)) u -= population[j++]?.pick as number;
        const cell = cells[j] as OutcomeRakingCell & { answered: number };
        const p = population[j] as (typeof population)[number];
        cell.count++;
        if (random() < p.dk) continue;
        cell.answered++;
        if (random() < p.yes) cell.successes++;
      }
      const [lower, upper] = summariseWeighting(cells, targets, { tolerance: 1e-10, maxIterations: 500 }).outcome?.interval as [number, number];
      if (lower <= truth && truth <= upper) covered++;
    }
    const coverage = covered / samples;
    console.log(`Korn–Graubard 95% interval of the ratio at ${truth.toFixed(4)} with 15% don't know: coverage ${(coverage * 100).toFixed(1)}%`);
    expect(coverage).toBeGreaterThanOrEqual(0.935);
    expect(coverage).toBeLessThanOrEqual(0.965);
  });
});
