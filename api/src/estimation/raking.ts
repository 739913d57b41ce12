import { EstimationInputError } from './errors.js';
import { prepare, type Prepared } from './raking-cells.js';

export { normaliseShares } from './raking-cells.js';

/** One category of a quota variable and its population share (any non-negative number; normalised per variable). */
export interface CategoryShare {
  category: string;
  share: number;
}

/** Population targets for one variable. */
export interface MarginTarget {
  variable: string;
  shares: readonly CategoryShare[];
  /** For a joint table of interlocked variables: the variables whose categories it crosses (joint-targets.ts). */
  parts?: readonly string[];
}

/**
 * A group of interviews that share every raking category (and the same base weight):
 * the unit raking works on, so its cost follows the number of cells, not interviews.
 */
export interface RakingCell {
  categories: Readonly<Record<string, string>>;
  count: number;
  /** Base weight of each interview in the cell; 1 when absent. */
  baseWeight?: number;
}

export interface RakingOptions {
  /** Bound on max |weighted share − target share| over all categories. Default 1e-6. */
  tolerance?: number;
  /** Limit on full sweeps over the variables. Default 100. */
  maxIterations?: number;
  /** Largest weight allowed, relative to mean 1. Default none. */
  cap?: number;
  /** Smallest weight allowed, relative to mean 1. Default none. */
  floor?: number;
}

export interface MarginReport {
  variable: string;
  category: string;
  /** Target share (normalised). */
  target: number;
  unweighted: number;
  weighted: number;
}

export interface RakingResult {
  converged: boolean;
  /** Full sweeps done. */
  iterations: number;
  /** Max |weighted share − target| over all categories after the last sweep. */
  maxMarginError: number;
  /** Weight of each interview in cell i (same order as the cells); mean 1 over interviews. */
  weights: number[];
  margins: MarginReport[];
}

/**
 * Raking (iterative proportional fitting) after Deming and Stephan (1940): starting from
 * the base weights, each variable's categories are scaled in turn to their target totals;
 * full sweeps repeat until every margin is within the tolerance or the sweep limit is hit.
 *
 * A cap and floor (relative to mean 1) are honoured by alternating cap and rake inside each
 * step: a category's factor is the one that meets its target once the scaled weights are
 * clipped to [floor, cap] (a monotone one-dimensional solve), the bounded raking of
 * Deville and Särndal (1992, "Calibration estimators in survey sampling", JASA 87) in its
 * iterative-proportional form. Bounds that no weights can meet are an input error.
 * Written down in docs/methods.md, section 1.
 */
export function rake(
  cells: readonly RakingCell[],
  targets: readonly MarginTarget[],
  options: RakingOptions = {},
): RakingResult {
  const tolerance = options.tolerance ?? 1e-6;
  const maxIterations = options.maxIterations ?? 100;
  const cap = options.cap ?? Infinity;
  const floor = options.floor ?? 0;
  if (!(tolerance > 0)) throw new EstimationInputError('tolerance must be a positive number');
  if (!Number.isInteger(maxIterations) || maxIterations < 1) {
    throw new EstimationInputError('maximum iterations must be a whole number of at least 1');
  }
  if (!(cap >= 1)) throw new EstimationInputError(`cap ${cap} is infeasible: weights have mean 1, so the cap must be at least 1`);
  if (!(floor >= 0 && floor <= 1)) {
    throw new EstimationInputError(`floor ${floor} is infeasible: it must lie between 0 and 1 (weights have mean 1)`);
  }
  const p = prepare(cells, targets);
  checkBoundsFeasible(p, targets, cap, floor);

  const weights = initialWeights(cells, p.n);
  const bounded = cap < Infinity || floor > 0;
  let error = maxError(p, weights).error;
  let iterations = 0;
  let stalled = 0;
  while (error > tolerance && iterations < maxIterations) {
    for (let v = 0; v < p.level.length; v++) adjustVariable(p, v, weights, floor, cap, bounded);
    iterations++;
    const previous = error;
    error = maxError(p, weights).error;
    // With bounds, sweeps that no longer move the worst margin mean the bounds cannot all hold.
    stalled = bounded && error > tolerance && Math.abs(previous - error) <= 1e-12 * previous ? stalled + 1 : 0;
    if (stalled >= 5) throw infeasibleTogether(p, targets, weights, cap, floor);
  }
  normaliseMean(weights, p.counts, p.n);
  return {
    converged: error <= tolerance,
    iterations,
    maxMarginError: error,
    weights: Array.from(weights),
    margins: marginReport(p, targets, weights),
  };
}

function checkBoundsFeasible(p: Prepared, targets: readonly MarginTarget[], cap: number, floor: number): void {
  p.targetTotals.forEach((totals, v) => {
    const sample = new Float64Array(totals.length);
    p.level[v]?.forEach((i, j) => (sample[i] = (sample[i] ?? 0) + (p.counts[j] ?? 0)));
    totals.forEach((target, i) => {
      const m = sample[i] ?? 0;
      if (m === 0) return;
      const needed = target / m;
      if (needed > cap || needed < floor) {
        const t = targets[v];
        throw new EstimationInputError(
          `cap ${cap} and floor ${floor} are infeasible: variable ${t?.variable} category "${t?.shares[i]?.category}" ` +
            `needs a mean weight of ${needed.toPrecision(4)}`,
        );
      }
    });
  });
}

function initialWeights(cells: readonly RakingCell[], n: number): Float64Array {
  const w = Float64Array.from(cells, (c, j) => {
    const b = c.baseWeight ?? 1;
    if (!(Number.isFinite(b) && b > 0)) throw new EstimationInputError(`cell ${j}: base weight must be a positive number`);
    return b;
  });
  let total = 0;
  cells.forEach((c, j) => (total += c.count * (w[j] ?? 0)));
  return w.map((x) => (x * n) / total);
}

function categoryTotals(p: Prepared, v: number, weights: Float64Array): Float64Array {
  const level = p.level[v] as Int32Array;
  const totals = new Float64Array((p.targetTotals[v] as Float64Array).length);
  for (let j = 0; j < level.length; j++) {
    const i = level[j] as number;
    totals[i] = (totals[i] as number) + (p.counts[j] as number) * (weights[j] as number);
  }
  return totals;
}

function adjustVariable(p: Prepared, v: number, weights: Float64Array, floor: number, cap: number, bounded: boolean): void {
  const level = p.level[v] as Int32Array;
  const targets = p.targetTotals[v] as Float64Array;
  const current = categoryTotals(p, v, weights);
  const factors = targets.map((t, i) => (t > 0 ? t / (current[i] as number) : 1));
  if (!bounded) {
    for (let j = 0; j < level.length; j++) weights[j] = (weights[j] as number) * (factors[level[j] as number] as number);
    return;
  }
  targets.forEach((target, i) => {
    if (target === 0) return;
    const members: number[] = [];
    for (let j = 0; j < level.length; j++) if (level[j] === i) members.push(j);
    const f = boundedFactor(members, p.counts, weights, target, floor, cap, factors[i] as number);
    for (const j of members) weights[j] = clip((weights[j] as number) * f, floor, cap);
  });
}

const clip = (x: number, lo: number, hi: number): number => Math.min(hi, Math.max(lo, x));

/** Factor f with Σ count·clip(w·f) = target: bisection on log f, then an exact solve on the final linear piece. */
function boundedFactor(
  members: number[], counts: Float64Array, weights: Float64Array,
  target: number, floor: number, cap: number, guess: number,
): number {
  const total = (f: number) => members.reduce((s, j) => s + (counts[j] as number) * clip((weights[j] as number) * f, floor, cap), 0);
  let lo = guess;
  let hi = guess;
  for (let k = 0; k < 1100 && total(lo) > target; k++) lo /= 2;
  for (let k = 0; k < 1100 && total(hi) < target; k++) hi *= 2;
  for (let k = 0; k < 200 && hi / lo > 1 + 1e-15; k++) {
    const mid = Math.sqrt(lo * hi);
    if (total(mid) < target) lo = mid;
    else hi = mid;
  }
  const f = Math.sqrt(lo * hi);
  let fixed = 0;
  let free = 0;
  for (const j of members) {
    const w = weights[j] as number;
    const c = counts[j] as number;
    if (w * f >= cap) fixed += c * cap;
    else if (w * f <= floor) fixed += c * floor;
    else free += c * w;
  }
  return free > 0 ? (target - fixed) / free : f;
}

function maxError(p: Prepared, weights: Float64Array): { error: number; variable: number; category: number } {
  const worst = { error: 0, variable: 0, category: 0 };
  for (let v = 0; v < p.level.length; v++) {
    const totals = categoryTotals(p, v, weights);
    const shares = p.targetShares[v] as number[];
    totals.forEach((t, i) => {
      const error = Math.abs(t / p.n - (shares[i] as number));
      if (error > worst.error) Object.assign(worst, { error, variable: v, category: i });
    });
  }
  return worst;
}

function infeasibleTogether(
  p: Prepared, targets: readonly MarginTarget[], weights: Float64Array, cap: number, floor: number,
): EstimationInputError {
  const worst = maxError(p, weights);
  const t = targets[worst.variable];
  return new EstimationInputError(
    `cap ${cap} and floor ${floor} are infeasible together: no weights within them meet every target ` +
      `(variable ${t?.variable} category "${t?.shares[worst.category]?.category}" stays ${worst.error.toPrecision(3)} off its share)`,
  );
}

function normaliseMean(weights: Float64Array, counts: Float64Array, n: number): void {
  let total = 0;
  weights.forEach((w, j) => (total += w * (counts[j] as number)));
  const scale = n / total;
  weights.forEach((w, j) => (weights[j] = w * scale));
}

function marginReport(p: Prepared, targets: readonly MarginTarget[], weights: Float64Array): MarginReport[] {
  const ones = new Float64Array(weights.length).fill(1);
  return targets.flatMap((t, v) => {
    const weighted = categoryTotals(p, v, weights);
    const unweighted = categoryTotals(p, v, ones);
    return t.shares.map((s, i) => ({
      variable: t.variable,
      category: s.category,
      target: p.targetShares[v]?.[i] as number,
      unweighted: (unweighted[i] as number) / p.n,
      weighted: (weighted[i] as number) / p.n,
    }));
  });
}
