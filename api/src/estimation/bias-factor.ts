import { jStat } from './jstat.js';
import { EstimationInputError } from './errors.js';
import { answeredOf, withReplacementVariance, type CellInfluence } from './linearised-share.js';

export const logit = (p: number): number => Math.log(p / (1 - p));
export const expit = (x: number): number => (x >= 0 ? 1 / (1 + Math.exp(-x)) : Math.exp(x) / (1 + Math.exp(x)));

/**
 * Share a source with bias factor b reports for true share p: logit(q) = logit(p) + logit(b)
 * (the odds-ratio form of a constant house effect; b = 0.5 is no bias; docs/methods.md, section 6).
 */
export function applyBiasFactor(p: number, b: number): number {
  return expit(logit(p) + logit(b));
}

/** Interviews in one weighting cell: how many, how many answered 1 (yes), and how many yes or no. */
export interface OutcomeCell {
  count: number;
  successes: number;
  /** Interviews that answered yes or no; the count when left out. */
  answered?: number;
}

/** The weighted share and each cell's influence on it, linearised through the raking (linearisedShare). */
export interface CalibratedShare {
  share: number;
  influence: readonly CellInfluence[];
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
 * unweighted and w the weighted share among those who answered yes or no (don't know and
 * no answer are raked but stay outside both shares), i.e. logit(b) = logit(u) − logit(w).
 *
 * Interval: delta method (Taylor linearisation, Wolter 2007, Introduction to Variance
 * Estimation, ch. 6) on logit(b), with both shares' influences taken jointly because they
 * come from the same interviews:
 *   d_i = (y_i − u·x_i) / (a·u(1−u)) − e_i / (w(1−w)),
 * x_i = 1 for a yes or no and 0 otherwise, a = Σx_i, e_i the interview's influence on the
 * ratio w linearised through the raking (Deville and Särndal 1992; linearisedShare), not (y_i − w)·weight_i: the raked weights depend on the sample's
 * mix, and treating them as fixed loses that part of the variance exactly when the sample
 * is well balanced. Var = n/(n−1)·Σ d_i², the interval logit(b) ± z·√Var mapped back
 * through the logistic function (docs/methods.md, section 6).
 */
export function impliedBiasFactor(cells: readonly OutcomeCell[], weighted: CalibratedShare, level = 0.95): ImpliedBiasFactor {
  if (!(level > 0 && level < 1)) throw new EstimationInputError('level must lie strictly between 0 and 1');
  if (weighted.influence.length !== cells.length) throw new EstimationInputError('one influence per cell is needed');
  let n = 0;
  let k = 0;
  let a = 0;
  for (const c of cells) {
    const answered = answeredOf(c);
    if (!(c.count >= 0 && c.successes >= 0 && c.successes <= answered && answered <= c.count)) {
      throw new EstimationInputError('each cell needs 0 ≤ successes ≤ answered ≤ count');
    }
    n += c.count;
    k += c.successes;
    a += answered;
  }
  if (!(n > 1)) throw new EstimationInputError('at least two weighted interviews are needed');
  if (!(a > 0)) throw new EstimationInputError('nobody answered yes or no, so there is no share');
  const u = k / a;
  const w = weighted.share;
  if (u <= 0 || u >= 1 || w <= 0 || w >= 1) {
    return { unweighted: u, weighted: w, factor: null, lower: null, upper: null, standardError: null };
  }
  const influence = cells.map((_, j) => {
    const e = weighted.influence[j] as CellInfluence;
    return {
      yes: (1 - u) / (a * u * (1 - u)) - e.yes / (w * (1 - w)),
      no: -u / (a * u * (1 - u)) - e.no / (w * (1 - w)),
      other: -e.other / (w * (1 - w)),
    };
  });
  const standardError = Math.sqrt(withReplacementVariance(cells, influence));
  return withInterval(u, w, standardError, level);
}

/** b with the interval logit(b) ± z·SE mapped back through the logistic function. */
export function withInterval(u: number, w: number, standardError: number, level = 0.95): ImpliedBiasFactor {
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
