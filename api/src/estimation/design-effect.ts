import { EstimationInputError } from './errors.js';

export interface DesignEffect {
  /** Number of interviews (sum of the counts). */
  n: number;
  designEffect: number;
  effectiveSampleSize: number;
}

/**
 * Kish's design effect of unequal weighting (Kish 1965, Survey Sampling; restated as 1 + L,
 * L the relvariance of the weights, in Kish 1992, "Weighting for unequal Pi", Journal of
 * Official Statistics 8(2)): deff = n·Σw² / (Σw)², and the
 * effective sample size n / deff (docs/methods.md, section 2). `counts[i]` interviews carry weight `weights[i]`
 * (one each when counts are omitted), so aggregated cells give the same answer as rows.
 */
export function kishDesignEffect(weights: readonly number[], counts?: readonly number[]): DesignEffect {
  if (counts && counts.length !== weights.length) throw new EstimationInputError('weights and counts differ in length');
  let n = 0;
  let sum = 0;
  let sumSquares = 0;
  weights.forEach((w, i) => {
    const c = counts ? (counts[i] as number) : 1;
    if (!(Number.isFinite(w) && w >= 0)) throw new EstimationInputError(`weight ${i} must be a non-negative number`);
    if (!(Number.isFinite(c) && c >= 0)) throw new EstimationInputError(`count ${i} must be a non-negative number`);
    n += c;
    sum += c * w;
    sumSquares += c * w * w;
  });
  if (!(n > 0 && sum > 0)) throw new EstimationInputError('no weighted interviews');
  const designEffect = (n * sumSquares) / (sum * sum);
  return { n, designEffect, effectiveSampleSize: n / designEffect };
}
