import { jStat } from './jstat.js';
import { EstimationInputError } from './errors.js';

export const logit = (p: number): number => Math.log(p / (1 - p));
export const expit = (x: number): number => (x >= 0 ? 1 / (1 + Math.exp(-x)) : Math.exp(x) / (1 + Math.exp(x)));

/**
 * Share a source with bias factor b reports for true share p: logit(q) = logit(p) + logit(b)
 * (the odds-ratio form of a constant house effect; b = 0.5 is no bias; docs/methods.md, section 6).
 */
export function applyBiasFactor(p: number, b: number): number {
  return expit(logit(p) + logit(b));
}

/** Interviews in one weighting cell: how many, how many answered 1, and each one's weight. */
export interface OutcomeCell {
  count: number;
  successes: number;
  weight: number;
}

export interface ImpliedBiasFactor {
  unweighted: number;
  weighted: number;
  /** odds(u) / (odds(u) + odds(w)); null when the outcome does not vary. */
  factor: number | null;
  lower: number | null;
  upper: number | null;
  /** Standard error of logit(factor). */
  standardError: number | null;
}

/**
 * Implied bias factor of a running sample: b = odds(u) / (odds(u) + odds(w)), u the
 * unweighted and w the weighted share, i.e. logit(b) = logit(u) − logit(w).
 *
 * Interval: delta method (Taylor linearisation, as in Wolter 2007, Introduction to Variance
 * Estimation, ch. 6) on logit(b). Both shares come from the same interviews, so each
 * interview's influence on logit(u) − logit(w) is taken jointly:
 *   d_i = (y_i − u) / (n·u(1−u)) − w_i (y_i − w) / (Σw · w(1−w)),
 * Var = n/(n−1)·Σ d_i² (with-replacement estimator, weights treated as fixed), and the
 * interval is logit(b) ± z·√Var mapped back through the logistic function (docs/methods.md, section 6).
 */
export function impliedBiasFactor(cells: readonly OutcomeCell[], level = 0.95): ImpliedBiasFactor {
  if (!(level > 0 && level < 1)) throw new EstimationInputError('level must lie strictly between 0 and 1');
  let n = 0;
  let k = 0;
  let sumW = 0;
  let sumWY = 0;
  for (const c of cells) {
    if (!(c.count >= 0 && c.successes >= 0 && c.successes <= c.count && c.weight >= 0)) {
      throw new EstimationInputError('each cell needs 0 ≤ successes ≤ count and a non-negative weight');
    }
    n += c.count;
    k += c.successes;
    sumW += c.count * c.weight;
    sumWY += c.successes * c.weight;
  }
  if (!(n > 1 && sumW > 0)) throw new EstimationInputError('at least two weighted interviews are needed');
  const u = k / n;
  const w = sumWY / sumW;
  if (u <= 0 || u >= 1 || w <= 0 || w >= 1) {
    return { unweighted: u, weighted: w, factor: null, lower: null, upper: null, standardError: null };
  }
  let sumSq = 0;
  for (const c of cells) {
    const d1 = (1 - u) / (n * u * (1 - u)) - (c.weight * (1 - w)) / (sumW * w * (1 - w));
    const d0 = -u / (n * u * (1 - u)) + (c.weight * w) / (sumW * w * (1 - w));
    sumSq += c.successes * d1 * d1 + (c.count - c.successes) * d0 * d0;
  }
  const standardError = Math.sqrt((n / (n - 1)) * sumSq);
  const centre = logit(u) - logit(w);
  const z = jStat.normal.inv(0.5 + level / 2, 0, 1);
  return {
    unweighted: u,
    weighted: w,
    factor: expit(centre),
    lower: expit(centre - z * standardError),
    upper: expit(centre + z * standardError),
    standardError,
  };
}
