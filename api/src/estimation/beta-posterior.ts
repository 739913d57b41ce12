import { jStat } from './jstat.js';
import { EstimationInputError } from './errors.js';

export interface BetaPosterior {
  alpha: number;
  beta: number;
  mean: number;
  median: number;
  /** Equal-tailed interval at the requested level. */
  lower: number;
  upper: number;
}

export interface BetaPosteriorOptions {
  /** Beta(α, β) prior; uniform Beta(1, 1) by default. */
  prior?: readonly [number, number];
  /** Interval level; 0.95 by default. */
  level?: number;
}

/**
 * Conjugate Beta–binomial update (Bayes–Laplace; e.g. Gelman et al. 2013, Bayesian Data
 * Analysis, 3rd ed., section 2.4): k successes in n trials on a Beta(α, β) prior give
 * Beta(α + k, β + n − k). Mean, median and equal-tailed interval from jstat's Beta functions.
 * docs/methods.md, section 7.
 */
export function betaPosterior(successes: number, trials: number, options: BetaPosteriorOptions = {}): BetaPosterior {
  const [a, b] = options.prior ?? [1, 1];
  const level = options.level ?? 0.95;
  checkCounts(successes, trials);
  checkPrior(a, b);
  if (!(level > 0 && level < 1)) throw new EstimationInputError('level must lie strictly between 0 and 1');
  const alpha = a + successes;
  const beta = b + trials - successes;
  const tail = (1 - level) / 2;
  return {
    alpha,
    beta,
    mean: alpha / (alpha + beta),
    median: jStat.beta.inv(0.5, alpha, beta),
    lower: jStat.beta.inv(tail, alpha, beta),
    upper: jStat.beta.inv(1 - tail, alpha, beta),
  };
}

export function checkCounts(successes: number, trials: number, label = ''): void {
  if (!(Number.isInteger(trials) && trials >= 0)) throw new EstimationInputError(`${label}trials must be a whole number, 0 or more`);
  if (!(Number.isInteger(successes) && successes >= 0 && successes <= trials)) {
    throw new EstimationInputError(`${label}successes must be a whole number between 0 and trials (${trials})`);
  }
}

export function checkPrior(a: number, b: number): void {
  if (!(Number.isFinite(a) && Number.isFinite(b) && a > 0 && b > 0)) {
    throw new EstimationInputError('prior must be two positive numbers α,β');
  }
}
