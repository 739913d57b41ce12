import { EstimationInputError } from './errors.js';
import { jStat } from './jstat.js';

export interface ShareInterval {
  lower: number;
  upper: number;
  /** Effective sample size of the estimate the interval was built on. */
  effectiveSampleSize: number;
}

/**
 * Korn and Graubard (1998, Survey Methodology 24:193–201) interval for a weighted share:
 * Clopper–Pearson on the estimate's own effective sample size n* = w(1−w)/SE² with
 * k* = n*·w successes, as `svyciprop(method = "beta")` in R's survey package computes it
 * (one stratum, so no degrees-of-freedom adjustment). When w is 0 or 1 the standard error
 * says nothing, so n* is Kish's effective sample size of the weights (`fallbackSize`).
 *
 * For the headline share, a ratio over those who answered yes or no, w is the ratio and SE
 * its linearised standard error, so n* is the ratio's own effective number of answers, and
 * the fallback is Kish's effective size of those who answered. Korn and Graubard's degrees-
 * of-freedom adjustment then applies, n* · (t(n−1) / t(df))² with n the interviews raked
 * and df = a − 1 for the a who answered, as `svyciprop(~yes, subset(design, answered),
 * method = "beta")` computes it (a domain mean is the same ratio, with the same error);
 * `degrees` left out means n − 1 = df, no adjustment (docs/methods.md, section 3).
 */
export function kornGraubardInterval(
  share: number,
  standardError: number,
  fallbackSize: number,
  level = 0.95,
  degrees?: { rows: number; df: number },
): ShareInterval {
  if (!(share >= 0 && share <= 1)) throw new EstimationInputError('share must lie between 0 and 1');
  if (!(standardError >= 0 && Number.isFinite(standardError))) throw new EstimationInputError('standard error must be a non-negative number');
  if (!(fallbackSize > 0)) throw new EstimationInputError('effective sample size must be positive');
  if (!(level > 0 && level < 1)) throw new EstimationInputError('level must lie between 0 and 1');
  const alpha = 1 - level;
  const edge = share === 0 || share === 1 || standardError === 0;
  const unadjusted = edge ? fallbackSize : (share * (1 - share)) / (standardError * standardError);
  const size = degrees && degrees.df >= 1 && degrees.rows - 1 !== degrees.df
    ? unadjusted * (jStat.studentt.inv(alpha / 2, degrees.rows - 1) / jStat.studentt.inv(alpha / 2, degrees.df)) ** 2
    : unadjusted;
  const k = size * share;
  const lower = k <= 0 ? 0 : jStat.beta.inv(alpha / 2, k, size - k + 1);
  const upper = k >= size ? 1 : jStat.beta.inv(1 - alpha / 2, k + 1, size - k);
  return { lower, upper, effectiveSampleSize: size };
}

/** The ± figure of an interval, only when its two half-widths are within 10% of each other. */
export function symmetricHalfWidth(share: number, lower: number, upper: number): number | null {
  const below = share - lower;
  const above = upper - share;
  const larger = Math.max(below, above);
  if (!(larger > 0)) return null;
  return Math.abs(below - above) <= 0.1 * larger ? (below + above) / 2 : null;
}
