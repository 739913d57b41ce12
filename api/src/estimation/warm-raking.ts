import { prepare, type Prepared } from './raking-cells.js';
import type { MarginTarget, RakingCell } from './raking.js';

/**
 * Raking (Deming and Stephan 1940, as `rake` in raking.ts, without cap or floor) of a fixed set
 * of cells whose counts change a little between runs: the cells are indexed once, and each run
 * starts from the weights of a run on nearby counts, so it settles in a few sweeps. Used to score
 * many "one more interview here" samples (next-interviews.ts); the same weights as `rake` to
 * within the tolerance.
 */
export class WarmRaking {
  private readonly p: Prepared;

  /** `cells` must hold every combination any later run gives a count to (a count of 0 is fine). */
  constructor(cells: readonly RakingCell[], targets: readonly MarginTarget[], private readonly tolerance = 1e-10, private readonly maxSweeps = 2000) {
    this.p = prepare(cells, targets);
  }

  /**
   * Weights (mean 1 over interviews) for these counts. `start` must be weights this raking gave
   * for other counts: raking keeps the start's products of per-category factors, so only such a
   * start ends at the weights raked from 1.
   */
  weights(counts: Float64Array, start?: Float64Array): Float64Array {
    const { level, targetShares } = this.p;
    const n = counts.reduce((a, b) => a + b, 0);
    const w = start ? Float64Array.from(start) : new Float64Array(counts.length).fill(1);
    const totals = targetShares.map((s) => new Float64Array(s.length));
    for (let sweep = 0; sweep < this.maxSweeps; sweep++) {
      let error = 0;
      for (let v = 0; v < level.length; v++) {
        const lv = level[v] as Int32Array;
        const shares = targetShares[v] as number[];
        const t = (totals[v] as Float64Array).fill(0);
        for (let j = 0; j < lv.length; j++) t[lv[j] as number] = (t[lv[j] as number] as number) + (counts[j] as number) * (w[j] as number);
        const factor = shares.map((s, i) => {
          const current = t[i] as number;
          error = Math.max(error, Math.abs(current / n - s));
          return current > 0 ? (s * n) / current : 1;
        });
        for (let j = 0; j < lv.length; j++) w[j] = (w[j] as number) * (factor[lv[j] as number] as number);
      }
      // `error` is measured before each variable's step, so a sweep within tolerance leaves every margin within it.
      if (error <= this.tolerance) break;
    }
    let total = 0;
    w.forEach((x, j) => (total += x * (counts[j] as number)));
    return w.map((x) => (x * n) / total);
  }
}

/** Kish's effective sample size (Σ c·w)² / Σ c·w² and design effect n·Σ c·w² / (Σ c·w)² (design-effect.ts). */
export function kish(counts: Float64Array, weights: Float64Array): { effectiveSampleSize: number; designEffect: number } {
  let n = 0;
  let sum = 0;
  let squares = 0;
  counts.forEach((c, j) => {
    const w = weights[j] as number;
    n += c;
    sum += c * w;
    squares += c * w * w;
  });
  return { effectiveSampleSize: (sum * sum) / squares, designEffect: (n * squares) / (sum * sum) };
}
