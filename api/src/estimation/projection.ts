// Projection to the end of fieldwork (docs/methods.md, "Projection to the end of fieldwork").
// Model: completes per field day are Poisson with a rate λ; after S completes over w observed
// days, λ has the Gamma(S, w) posterior under the scale-invariant prior 1/λ, so the completes
// over the next D days follow the negative binomial (Poisson–gamma mixture) with size r = S and
// success probability p = w / (w + D): mean S·D/w = pace × days, variance mean × (1 + D/w), which
// widens the Poisson interval by the uncertainty of the pace itself (Gelman et al., Bayesian
// Data Analysis, 3rd ed., section 2.6: the negative binomial predictive of a Poisson rate).
import { EstimationInputError } from './errors.js';
import { jStat } from './jstat.js';

/** The predictive count of completes over the remaining days; size 0 is "no pace": surely 0. */
export interface PacePredictive {
  size: number;
  p: number;
}

/** The predictive count over `days` more days after `completes` over `windowDays` observed days. */
export function pacePredictive(completes: number, windowDays: number, days: number): PacePredictive {
  if (!(windowDays > 0)) throw new EstimationInputError('windowDays must be more than 0');
  if (!(completes >= 0) || !Number.isInteger(completes)) throw new EstimationInputError('completes must be a whole number, 0 or more');
  if (!(days >= 0)) throw new EstimationInputError('days must be 0 or more');
  return { size: completes, p: windowDays / (windowDays + days) };
}

export function predictiveMean(d: PacePredictive): number {
  return d.size === 0 || d.p === 1 ? 0 : (d.size * (1 - d.p)) / d.p;
}

/** P(X ≤ k): the regularised incomplete beta I_p(r, k + 1). */
export function predictiveCdf(d: PacePredictive, k: number): number {
  if (k < 0) return 0;
  if (d.size === 0 || d.p === 1) return 1;
  return jStat.ibeta(d.p, d.size, Math.floor(k) + 1);
}

/** The smallest whole k with P(X ≤ k) ≥ q. */
export function predictiveQuantile(d: PacePredictive, q: number): number {
  if (predictiveCdf(d, 0) >= q) return 0;
  let hi = Math.max(1, Math.ceil(predictiveMean(d)));
  while (predictiveCdf(d, hi) < q) hi *= 2;
  let lo = 0; // cdf(lo) < q ≤ cdf(hi)
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (predictiveCdf(d, mid) >= q) hi = mid;
    else lo = mid;
  }
  return hi;
}

export interface CountInterval {
  expected: number;
  lower: number;
  upper: number;
}

/** The expected count over the remaining days with its central interval at `level`. */
export function predictiveInterval(d: PacePredictive, level: number): CountInterval {
  const tail = (1 - level) / 2;
  return { expected: predictiveMean(d), lower: predictiveQuantile(d, tail), upper: predictiveQuantile(d, 1 - tail) };
}

export interface ProjectionInput {
  /** Counted completes so far (all days). */
  completes: number;
  /** Completes over the observed window and its length in field days. */
  windowCompletes: number;
  windowDays: number;
  /** Remaining field days (day equivalents, may be fractional), 0 after the field end; null without a field end. */
  remainingDays: number | null;
  target: number;
  /** Central interval level, e.g. 0.9. */
  level: number;
}

export interface TotalProjection {
  pacePerDay: number;
  /** The total at the field end: now + expected remaining; null without a field end. */
  atEnd: CountInterval | null;
  /** P(total at the field end < target); null without a field end. */
  probabilityBelowTarget: number | null;
  /** Days from now until the target is reached: expected (need ÷ pace, rounded up), and the days by which it is reached with probability (1 − level)/2 and (1 + level)/2; 0 when reached, null with no pace. */
  daysToTarget: { expected: number; earliest: number; latest: number } | null;
}

const MAX_DAYS = 3650;

/** The first whole day d ≤ MAX_DAYS by which P(completes over d days ≥ need) ≥ q; null if none. */
function dayReached(input: ProjectionInput, need: number, q: number): number | null {
  const reached = (d: number) => 1 - predictiveCdf(pacePredictive(input.windowCompletes, input.windowDays, d), need - 1) >= q;
  if (!reached(MAX_DAYS)) return null;
  let lo = 0;
  let hi = MAX_DAYS;
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (reached(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

export function projectTotal(input: ProjectionInput): TotalProjection {
  if (!(input.target >= 0)) throw new EstimationInputError('target must be 0 or more');
  if (!(input.level > 0 && input.level < 1)) throw new EstimationInputError('level must be between 0 and 1');
  const pacePerDay = input.windowCompletes / input.windowDays;
  const need = input.target - input.completes;
  let atEnd: CountInterval | null = null;
  let probabilityBelowTarget: number | null = null;
  if (input.remainingDays !== null) {
    const d = pacePredictive(input.windowCompletes, input.windowDays, input.remainingDays);
    const more = predictiveInterval(d, input.level);
    atEnd = { expected: input.completes + more.expected, lower: input.completes + more.lower, upper: input.completes + more.upper };
    probabilityBelowTarget = need <= 0 ? 0 : predictiveCdf(d, need - 1);
  }
  let daysToTarget: TotalProjection['daysToTarget'] = null;
  if (need <= 0) daysToTarget = { expected: 0, earliest: 0, latest: 0 };
  else if (pacePerDay > 0) {
    const tail = (1 - input.level) / 2;
    const earliest = dayReached(input, need, tail);
    const latest = dayReached(input, need, 1 - tail);
    if (earliest !== null && latest !== null) daysToTarget = { expected: Math.ceil(need / pacePerDay), earliest, latest };
  }
  return { pacePerDay, atEnd, probabilityBelowTarget, daysToTarget };
}

export interface CellPaceInput {
  id: string;
  target: number;
  achieved: number;
  windowCompletes: number;
  /** A closed cell takes no more interviews. */
  closed: boolean;
}

export interface CellProjection extends CountInterval {
  id: string;
  pacePerDay: number;
  probabilityBelowTarget: number;
  atRisk: boolean;
}

/** A cell is at risk when it ends below its target with probability over this (issue 12). */
export const AT_RISK_PROBABILITY = 0.2;

/** Each cell's count at the field end from its own pace, and its chance of ending below target. */
export function projectCells(cells: CellPaceInput[], windowDays: number, remainingDays: number, level: number): CellProjection[] {
  return cells.map((c) => {
    const d = pacePredictive(c.closed ? 0 : c.windowCompletes, windowDays, remainingDays);
    const more = predictiveInterval(d, level);
    const need = c.target - c.achieved;
    const probabilityBelowTarget = need <= 0 ? 0 : predictiveCdf(d, need - 1);
    return {
      id: c.id,
      pacePerDay: c.closed ? 0 : c.windowCompletes / windowDays,
      expected: c.achieved + more.expected,
      lower: c.achieved + more.lower,
      upper: c.achieved + more.upper,
      probabilityBelowTarget,
      atRisk: probabilityBelowTarget > AT_RISK_PROBABILITY,
    };
  });
}
