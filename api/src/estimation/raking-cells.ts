import { EstimationInputError } from './errors.js';
import { categoryOf } from './joint-names.js';
import type { MarginTarget, RakingCell } from './raking.js';

/** Cells and targets in index form, checked once before raking starts. */
export interface Prepared {
  /** level[v][j]: index of cell j's category in variable v. */
  level: Int32Array[];
  counts: Float64Array;
  /** Target total weight per variable and category (shares × n). */
  targetTotals: Float64Array[];
  targetShares: number[][];
  n: number;
}

export function prepare(cells: readonly RakingCell[], targets: readonly MarginTarget[]): Prepared {
  if (targets.length === 0) throw new EstimationInputError('no raking variables given');
  if (cells.length === 0) throw new EstimationInputError('no interviews to weight');
  const seen = new Set<string>();
  const counts = Float64Array.from(cells, (c, j) => {
    if (!(Number.isFinite(c.count) && c.count >= 0)) throw new EstimationInputError(`cell ${j}: count must be a non-negative number`);
    return c.count;
  });
  const n = counts.reduce((a, b) => a + b, 0);
  if (!(n > 0)) throw new EstimationInputError('no interviews to weight');
  const level: Int32Array[] = [];
  const targetTotals: Float64Array[] = [];
  const targetShares: number[][] = [];
  for (const t of targets) {
    if (seen.has(t.variable)) throw new EstimationInputError(`variable ${t.variable} is given twice`);
    seen.add(t.variable);
    const shares = normaliseShares(t);
    const index = new Map(t.shares.map((s, i) => [s.category, i]));
    const lv = new Int32Array(cells.length);
    const sample = new Float64Array(t.shares.length);
    cells.forEach((cell, j) => {
      const category = categoryOf(cell.categories, t);
      if (category === undefined) throw new EstimationInputError(`variable ${t.variable} is missing from the interviews`);
      const i = index.get(category);
      if (i === undefined) throw new EstimationInputError(`variable ${t.variable}: category "${category}" has no target`);
      lv[j] = i;
      sample[i] = (sample[i] ?? 0) + (counts[j] ?? 0);
    });
    shares.forEach((share, i) => {
      const category = t.shares[i]?.category ?? '';
      if (share > 0 && sample[i] === 0) {
        throw new EstimationInputError(`variable ${t.variable}: category "${category}" has a target but no respondents`);
      }
      if (share === 0 && (sample[i] ?? 0) > 0) {
        throw new EstimationInputError(`variable ${t.variable}: category "${category}" has respondents but a target share of 0`);
      }
    });
    level.push(lv);
    targetShares.push(shares);
    targetTotals.push(Float64Array.from(shares, (s) => s * n));
  }
  return { level, counts, targetTotals, targetShares, n };
}

/** Shares of one variable scaled to sum to 1, after checking they are usable. */
export function normaliseShares(t: MarginTarget): number[] {
  const categories = new Set<string>();
  let sum = 0;
  for (const s of t.shares) {
    if (categories.has(s.category)) throw new EstimationInputError(`variable ${t.variable}: category "${s.category}" is given twice`);
    categories.add(s.category);
    if (!(Number.isFinite(s.share) && s.share >= 0)) {
      throw new EstimationInputError(`variable ${t.variable}: category "${s.category}" share must be a non-negative number`);
    }
    sum += s.share;
  }
  if (!(sum > 0)) throw new EstimationInputError(`variable ${t.variable}: all shares are zero`);
  return t.shares.map((s) => s.share / sum);
}
