import { describe, expect, it } from 'vitest';
import { summariseWeighting, type OutcomeRakingCell } from './weighting-summary.js';
import { withholdingReasons } from './withheld.js';
import type { MarginTarget } from './raking.js';

// Thresholds are common practice (docs/methods.md, section 4): effective sample size under 30,
// a category with fewer than 5 interviews, raking that did not converge, an empty interlocked cell.
const targets: MarginTarget[] = [
  { variable: 'sex', shares: [{ category: 'female', share: 0.5 }, { category: 'male', share: 0.5 }] },
  { variable: 'age', shares: [{ category: 'young', share: 0.4 }, { category: 'old', share: 0.6 }] },
];
const cell = (sex: string, age: string, count: number, successes: number): OutcomeRakingCell => ({ categories: { sex, age }, count, successes });
const healthy = [cell('female', 'young', 30, 12), cell('female', 'old', 40, 20), cell('male', 'young', 25, 10), cell('male', 'old', 45, 25)];

describe('figures withheld when they cannot be trusted', () => {
  it('gives every figure for a healthy sample', () => {
    const summary = summariseWeighting(healthy, targets);
    expect(summary.withheld).toEqual([]);
    expect(summary.outcome!.interval).not.toBeNull();
    expect(summary.outcome!.impliedBiasFactorInterval).not.toBeNull();
  });

  it('withholds the intervals and the margin of error, with the reason, when a category has fewer than 5 interviews', () => {
    const thin = [cell('female', 'young', 3, 1), cell('female', 'old', 40, 20), cell('male', 'young', 1, 1), cell('male', 'old', 45, 25)];
    const summary = summariseWeighting(thin, targets);
    expect(summary.withheld.map((w) => w.figure)).toEqual(['standardError', 'interval', 'marginOfError', 'impliedBiasFactorInterval']);
    expect(summary.withheld[0]!.reason).toContain('age: young has 4 interviews, fewer than 5');
    expect(summary.outcome).toMatchObject({ standardError: null, interval: null, marginOfError: null, impliedBiasFactorInterval: null });
    // The point figures stay: only their uncertainty is withheld.
    expect(summary.outcome!.weighted).toBeGreaterThan(0);
    expect(summary.outcome!.impliedBiasFactor).not.toBeNull();
  });

  it('withholds them when the effective sample size is under 30', () => {
    const small = [cell('female', 'young', 6, 2), cell('female', 'old', 6, 3), cell('male', 'young', 6, 3), cell('male', 'old', 6, 4)];
    const summary = summariseWeighting(small, targets);
    expect(summary.effectiveSampleSize).toBeLessThan(30);
    expect(summary.withheld[0]!.reason).toMatch(/^the effective sample size is \d+\.\d, under 30$/);
  });

  it('withholds them when raking did not converge, saying how far off it stayed', () => {
    const summary = summariseWeighting(healthy, targets, { maxIterations: 1, tolerance: 1e-15 });
    expect(summary.converged).toBe(false);
    expect(summary.withheld[0]!.reason).toMatch(/^raking did not converge in 1 sweeps \(a weighted share is still \d+\.\d\d points off its target\)$/);
  });

  it('withholds them when an interlocked cell with a target has no interviews, and suggests merging', () => {
    const reasons = withholdingReasons({
      converged: true, iterations: 3, maxMarginError: 0, effectiveSampleSize: 120, cells: healthy, targets,
      emptyInterlockedCells: ['age band: 18-24 × sex: male'],
    });
    expect(reasons).toEqual(['the interlocked cell age band: 18-24 × sex: male has a target but no interviews (merging it with a neighbouring category would let it be weighted)']);
  });
});
