import { jStat } from './jstat.js';
import { EstimationInputError } from './errors.js';

/** log P(K = k) for K ~ BetaBinomial(n, α, β). */
export function betaBinomialLogPmf(k: number, n: number, alpha: number, beta: number): number {
  return (
    jStat.gammaln(n + 1) - jStat.gammaln(k + 1) - jStat.gammaln(n - k + 1) +
    jStat.betaln(k + alpha, n - k + beta) - jStat.betaln(alpha, beta)
  );
}

/**
 * One tail of the beta-binomial distribution (Skellam 1948, JRSS B 10(2)): P(K ≥ k) when
 * `upper`, else P(K ≤ k). Summed term by term from k outward with the exact ratio
 * P(j+1)/P(j) = (n−j)(j+α) / ((j+1)(n−j−1+β)), so tiny tails keep full relative precision.
 */
export function betaBinomialTail(k: number, n: number, alpha: number, beta: number, upper: boolean): number {
  const logStart = betaBinomialLogPmf(k, n, alpha, beta);
  let term = 1;
  let sum = 1;
  if (upper) {
    for (let j = k; j < n && term > sum * 1e-17; j++) {
      term *= ((n - j) * (j + alpha)) / ((j + 1) * (n - j - 1 + beta));
      sum += term;
    }
  } else {
    for (let j = k; j > 0 && term > sum * 1e-17; j--) {
      term *= (j * (n - j + beta)) / ((n - j + 1) * (j - 1 + alpha));
      sum += term;
    }
  }
  return Math.min(1, Math.exp(logStart + Math.log(sum)));
}

/**
 * Chance-outlier probability: the posterior predictive probability that a poll of n
 * interviews lands at least as far from the predicted mean as k did, on the side where k
 * lies, when the truth is learnt from the other polls taken as unbiased. With a Beta(a, b)
 * prior and the others' K successes in N trials the predictive is
 * BetaBinomial(n, a + K, b + N − K) (Gelman et al. 2013, Bayesian Data Analysis, 3rd ed., 2.4).
 * docs/methods.md, section 9.
 */
export function chanceOutlierProbability(
  poll: { successes: number; trials: number },
  others: { successes: number; trials: number },
  prior: readonly [number, number] = [1, 1],
): number {
  const { successes: k, trials: n } = poll;
  if (!(Number.isInteger(n) && n > 0 && Number.isInteger(k) && k >= 0 && k <= n)) {
    throw new EstimationInputError('a poll needs whole-number successes between 0 and trials, and trials above 0');
  }
  const alpha = prior[0] + others.successes;
  const beta = prior[1] + others.trials - others.successes;
  const predictedMean = (n * alpha) / (alpha + beta);
  return betaBinomialTail(k, n, alpha, beta, k >= predictedMean);
}
