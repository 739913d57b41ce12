import { impliedBiasFactor } from './bias-factor.js';
import { kishDesignEffect } from './design-effect.js';
import { linearisedShare } from './linearised-share.js';
import { rake, type MarginReport, type MarginTarget, type RakingCell, type RakingOptions } from './raking.js';
import { kornGraubardInterval } from './share-interval.js';
import { withheldFigures, withholdingReasons, type WithheldFigure } from './withheld.js';

/** z of a two-sided 95% normal interval. */
const Z95 = 1.96;

/** A raking cell that also carries how many of its interviews answered the outcome with 1. */
export interface OutcomeRakingCell extends RakingCell {
  successes: number;
}

export interface OutcomeSummary {
  unweighted: number;
  weighted: number;
  /** Standard error of the weighted share, linearised through the raking; null below two interviews. */
  standardError: number | null;
  /** Korn–Graubard 95% interval [lower, upper] of the weighted share; null below two interviews. */
  interval: [number, number] | null;
  /** How standardError and interval were computed. */
  method: string;
  /** z × standardError: the ± figure, meaningful only when the interval is near symmetric. */
  marginOfError: number | null;
  impliedBiasFactor: number | null;
  impliedBiasFactorInterval: [number, number] | null;
}

export interface WeightingSummary {
  converged: boolean;
  iterations: number;
  n: number;
  /** Kish's design effect of the weights: the cost of weighting, not the share's error. */
  designEffect: number;
  /** Kish's effective sample size n / deff: the cost of weighting. */
  effectiveSampleSize: number;
  weightMin: number;
  weightMax: number;
  maxMarginError: number;
  margins: MarginReport[];
  /** Weight of each interview in cell i (mean 1 over interviews). */
  weights: number[];
  outcome?: OutcomeSummary;
  /** Figures not given because they cannot be trusted, each with the reason (docs/methods.md, section 4). */
  withheld: WithheldFigure[];
}

/**
 * Everything a lead reads off a weighting run, computed one way for the API and the
 * command line alike: raking (Deming and Stephan 1940) to the targets, Kish's design
 * effect and effective sample size of the weights (the cost of weighting), the weighted
 * outcome share with its standard error linearised through the raking and its Korn–Graubard
 * interval, and the implied bias factor between the unweighted and weighted shares
 * (docs/methods.md, sections 1 to 3 and 6).
 */
export function summariseWeighting(
  cells: readonly OutcomeRakingCell[],
  targets: readonly MarginTarget[],
  options: RakingOptions = {},
  withOutcome = true,
  emptyInterlockedCells: readonly string[] = [],
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
    withheld: [],
  };
  if (withOutcome) {
    const bias = impliedBiasFactor(cells.map((c, j) => ({ count: c.count, successes: c.successes, weight: weights[j] as number })));
    const error = shareError(cells, targets, weights, deff.effectiveSampleSize);
    summary.outcome = {
      unweighted: bias.unweighted,
      weighted: bias.weighted,
      ...error,
      impliedBiasFactor: bias.factor,
      impliedBiasFactorInterval: bias.lower === null || bias.upper === null ? null : [bias.lower, bias.upper],
    };
    summary.withheld = withheldFigures(
      withholdingReasons({ ...result, effectiveSampleSize: deff.effectiveSampleSize, cells, targets, emptyInterlockedCells }),
    );
    for (const { figure } of summary.withheld) summary.outcome[figure] = null;
  }
  return summary;
}

export const SHARE_METHOD =
  'standard error linearised through the raking (Deville and Särndal 1992); ' +
  'interval Korn and Graubard (1998) Clopper–Pearson on the effective sample size; ' +
  'for quota samples a model-based figure';

function shareError(
  cells: readonly OutcomeRakingCell[],
  targets: readonly MarginTarget[],
  weights: readonly number[],
  kishSize: number,
): Pick<OutcomeSummary, 'standardError' | 'interval' | 'method' | 'marginOfError'> {
  const used = cells.filter((c) => c.count > 0);
  if (used.reduce((s, c) => s + c.count, 0) < 2) return { standardError: null, interval: null, method: SHARE_METHOD, marginOfError: null };
  const index = targets.map((t) => new Map(t.shares.map((s, i) => [s.category, i])));
  const { share, standardError } = linearisedShare(cells.map((c, j) => ({
    levels: targets.map((t, v) => index[v]?.get(c.categories[t.variable] as string) as number),
    count: c.count,
    successes: c.successes,
    baseWeight: c.baseWeight ?? 1,
    weight: weights[j] as number,
  })));
  const { lower, upper } = kornGraubardInterval(share, standardError, kishSize);
  return { standardError, interval: [lower, upper], method: SHARE_METHOD, marginOfError: Z95 * standardError };
}
