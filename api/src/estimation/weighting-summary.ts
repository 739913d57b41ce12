import { impliedBiasFactor } from './bias-factor.js';
import { kishDesignEffect, marginOfError } from './design-effect.js';
import { rake, type MarginReport, type MarginTarget, type RakingCell, type RakingOptions } from './raking.js';

/** A raking cell that also carries how many of its interviews answered the outcome with 1. */
export interface OutcomeRakingCell extends RakingCell {
  successes: number;
}

export interface OutcomeSummary {
  unweighted: number;
  weighted: number;
  marginOfError: number;
  impliedBiasFactor: number | null;
  impliedBiasFactorInterval: [number, number] | null;
}

export interface WeightingSummary {
  converged: boolean;
  iterations: number;
  n: number;
  designEffect: number;
  effectiveSampleSize: number;
  weightMin: number;
  weightMax: number;
  maxMarginError: number;
  margins: MarginReport[];
  /** Weight of each interview in cell i (mean 1 over interviews). */
  weights: number[];
  outcome?: OutcomeSummary;
}

/**
 * Everything a lead reads off a weighting run, computed one way for the API and the
 * command line alike: raking (Deming and Stephan 1940) to the targets, Kish's design
 * effect and effective sample size of the weights, the weighted outcome share with its
 * margin of error (inflated by the design effect) and the implied bias factor between
 * the unweighted and weighted shares (docs/methods.md, sections 1 to 3 and 6).
 */
export function summariseWeighting(
  cells: readonly OutcomeRakingCell[],
  targets: readonly MarginTarget[],
  options: RakingOptions = {},
  withOutcome = true,
): WeightingSummary {
  const result = rake(cells, targets, options);
  const weights = result.weights;
  const counts = cells.map((c) => c.count);
  const deff = kishDesignEffect(weights, counts);
  const used = weights.filter((_, j) => (counts[j] as number) > 0);
  const summary: WeightingSummary = {
    converged: result.converged,
    iterations: result.iterations,
    n: deff.n,
    designEffect: deff.designEffect,
    effectiveSampleSize: deff.effectiveSampleSize,
    weightMin: Math.min(...used),
    weightMax: Math.max(...used),
    maxMarginError: result.maxMarginError,
    margins: result.margins,
    weights,
  };
  if (withOutcome) {
    const bias = impliedBiasFactor(cells.map((c, j) => ({ count: c.count, successes: c.successes, weight: weights[j] as number })));
    summary.outcome = {
      unweighted: bias.unweighted,
      weighted: bias.weighted,
      marginOfError: marginOfError(bias.weighted, deff.n, deff.designEffect),
      impliedBiasFactor: bias.factor,
      impliedBiasFactorInterval: bias.lower === null || bias.upper === null ? null : [bias.lower, bias.upper],
    };
  }
  return summary;
}
