import { impliedBiasFactor, type ImpliedBiasFactor } from './bias-factor.js';
import { jackknifeBiasFactor } from './bias-factor-jackknife.js';
import { kishDesignEffect } from './design-effect.js';
import { answeredOf, linearisedShare, type LinearisedShare } from './linearised-share.js';
import { categoryOf } from './joint-names.js';
import { marginOf, resolveTargets } from './joint-targets.js';
import { rake, type MarginReport, type MarginTarget, type RakingCell, type RakingOptions } from './raking.js';
import { kornGraubardInterval } from './share-interval.js';
import { withheldFigures, withholdingReasons, type WithheldFigure } from './withheld.js';

/** z of a two-sided 95% normal interval. */
const Z95 = 1.96;

/**
 * A raking cell that also carries how many of its interviews answered the outcome with 1
 * (yes), how many answered yes or no, and how many of the rest said don't know (the others
 * gave no answer). Every interview is raked; the share is over those who answered.
 */
export interface OutcomeRakingCell extends RakingCell {
  successes: number;
  /** Interviews that answered yes or no; the count when left out (a 0/1 outcome). */
  answered?: number;
  /** Of the interviews that did not answer yes or no, those who said don't know. */
  dontKnow?: number;
}

/** Share of all raked interviews giving an answer outside the ratio (docs/methods.md, section 2). */
export interface OtherAnswerShare {
  answer: 'dont_know' | 'no_answer';
  count: number;
  unweighted: number;
  weighted: number;
}

export interface OutcomeSummary {
  /** Share of yes among those who answered yes or no, unweighted. */
  unweighted: number;
  /** The same share weighted: a ratio Σw·yes / Σw·answered over the calibrated design. */
  weighted: number;
  /** Interviews that answered yes or no (the share's base). */
  answered: number;
  /** Don't know and no answer, as shares of every raked interview, beside the headline share. */
  otherAnswers: OtherAnswerShare[];
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
  /** How the bias factor's interval was computed. */
  impliedBiasFactorMethod: string;
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
  const { raking, joint } = resolveTargets(targets);
  const given = targets.map((t) => t.variable);
  targets = raking;
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
    // In the order the targets were given; a joint table's variables follow the table.
    margins: [...result.margins, ...partMargins(cells, weights, joint)]
      .map((m, i) => ({ m, i, at: positionOf(given, m.variable, joint) }))
      .sort((a, b) => a.at - b.at || a.i - b.i)
      .map(({ m }) => m),
    weights,
    withheld: [],
  };
  const answered = cells.reduce((s, c) => s + answeredOf(c), 0);
  if (withOutcome && answered > 0) {
    const linearised = linearise(cells, targets, weights);
    const bias = biasFactor(cells, targets, options, linearised);
    const answeredSize = answeredEffectiveSize(cells, weights);
    summary.outcome = {
      unweighted: bias.unweighted,
      weighted: bias.weighted,
      answered,
      otherAnswers: otherAnswers(cells, weights),
      ...shareError(linearised, answeredSize, { rows: deff.n, df: answered - 1 }),
      impliedBiasFactor: bias.factor,
      impliedBiasFactorInterval: bias.lower === null || bias.upper === null ? null : [bias.lower, bias.upper],
      impliedBiasFactorMethod: bias.method,
    };
    summary.withheld = withheldFigures(
      withholdingReasons({ ...result, effectiveSampleSize: deff.effectiveSampleSize, answeredEffectiveSize: answeredSize, cells, targets, emptyInterlockedCells }),
    );
    for (const { figure } of summary.withheld) summary.outcome[figure] = null;
  }
  return summary;
}

export const SHARE_METHOD =
  'share of yes among those who answered yes or no, a ratio estimator; ' +
  'standard error linearised through the raking (Deville and Särndal 1992); ' +
  'interval Korn and Graubard (1998) Clopper–Pearson on the effective sample size; ' +
  'for quota samples a model-based figure';

/** Kish's effective size of those who answered yes or no: (Σ a·w)² / Σ a·w². */
function answeredEffectiveSize(cells: readonly OutcomeRakingCell[], weights: readonly number[]): number {
  let sum = 0;
  let squares = 0;
  cells.forEach((c, j) => {
    const w = weights[j] as number;
    sum += answeredOf(c) * w;
    squares += answeredOf(c) * w * w;
  });
  return squares > 0 ? (sum * sum) / squares : 0;
}

function otherAnswers(cells: readonly OutcomeRakingCell[], weights: readonly number[]): OtherAnswerShare[] {
  if (!cells.some((c) => c.answered !== undefined)) return [];
  const n = cells.reduce((s, c) => s + c.count, 0);
  const total = cells.reduce((s, c, j) => s + c.count * (weights[j] as number), 0);
  const share = (answer: OtherAnswerShare['answer'], countOf: (c: OutcomeRakingCell) => number): OtherAnswerShare => {
    const count = cells.reduce((s, c) => s + countOf(c), 0);
    const weighted = cells.reduce((s, c, j) => s + countOf(c) * (weights[j] as number), 0);
    return { answer, count, unweighted: n > 0 ? count / n : 0, weighted: total > 0 ? weighted / total : 0 };
  };
  return [
    share('dont_know', (c) => c.dontKnow ?? 0),
    share('no_answer', (c) => c.count - answeredOf(c) - (c.dontKnow ?? 0)),
  ];
}

function positionOf(given: string[], variable: string, joint: readonly MarginTarget[]): number {
  const own = given.indexOf(variable);
  if (own >= 0) return own;
  const table = joint.find((j) => j.parts?.includes(variable));
  return table ? given.indexOf(table.variable) + 0.5 : given.length;
}

/** The margins of the variables in joint tables, weighted and unweighted, against the table's sums. */
function partMargins(cells: readonly OutcomeRakingCell[], weights: readonly number[], joint: readonly MarginTarget[]): MarginReport[] {
  const n = cells.reduce((s, c) => s + c.count, 0);
  return joint.flatMap((table) => (table.parts ?? []).map((part) => marginOf(table, part)).flatMap((margin) =>
    margin.shares.map((s) => {
      const inside = cells.map((c, j) => (c.categories[margin.variable] === s.category ? j : -1)).filter((j) => j >= 0);
      const count = inside.reduce((t, j) => t + (cells[j]?.count as number), 0);
      const weighted = inside.reduce((t, j) => t + (cells[j]?.count as number) * (weights[j] as number), 0);
      return { variable: margin.variable, category: s.category, target: s.share, unweighted: count / n, weighted: weighted / n };
    }),
  ));
}

/** The share linearised through the raking; null below two interviews. */
function linearise(cells: readonly OutcomeRakingCell[], targets: readonly MarginTarget[], weights: readonly number[]): LinearisedShare | null {
  if (cells.reduce((s, c) => s + c.count, 0) < 2) return null;
  const index = targets.map((t) => new Map(t.shares.map((s, i) => [s.category, i])));
  return linearisedShare(cells.map((c, j) => ({
    levels: targets.map((t, v) => index[v]?.get(categoryOf(c.categories, t) as string) as number),
    count: c.count,
    successes: c.successes,
    answered: answeredOf(c),
    baseWeight: c.baseWeight ?? 1,
    weight: weights[j] as number,
  })));
}

function shareError(
  linearised: LinearisedShare | null,
  kishSize: number,
  degrees: { rows: number; df: number },
): Pick<OutcomeSummary, 'standardError' | 'interval' | 'method' | 'marginOfError'> {
  if (linearised === null) return { standardError: null, interval: null, method: SHARE_METHOD, marginOfError: null };
  const { share, standardError } = linearised;
  const { lower, upper } = kornGraubardInterval(share, standardError, kishSize, 0.95, degrees);
  return { standardError, interval: [lower, upper], method: SHARE_METHOD, marginOfError: Z95 * standardError };
}

export const BIAS_DELTA_METHOD = 'delta method on logit(b), linearised through the raking';
export const BIAS_JACKKNIFE_METHOD = 'delete-one jackknife over the interviews, re-raking each time';

function biasFactor(
  cells: readonly OutcomeRakingCell[],
  targets: readonly MarginTarget[],
  options: RakingOptions,
  linearised: LinearisedShare | null,
): ImpliedBiasFactor & { method: string } {
  if (linearised === null) {
    const a = cells.reduce((s, c) => s + answeredOf(c), 0);
    const u = a > 0 ? cells.reduce((s, c) => s + c.successes, 0) / a : NaN;
    return { unweighted: u, weighted: u, factor: null, lower: null, upper: null, standardError: null, method: BIAS_DELTA_METHOD };
  }
  if (needsJackknife(cells)) return { ...jackknifeBiasFactor(cells, targets, options), method: BIAS_JACKKNIFE_METHOD };
  return { ...impliedBiasFactor(cells, linearised), method: BIAS_DELTA_METHOD };
}

/**
 * Fewer interviews than this giving the less common answer, and the bias factor's interval
 * comes from the jackknife: in our seeded simulations (test/reference/bias-factor-coverage.spec.ts,
 * docs/methods.md, section 6) the delta method's 95% interval covered 91–94% of the time at
 * shares near 5% with 200–400 interviews, the jackknife 93.5–95%; with 100 or more of each
 * answer the two agree to the third decimal and the delta method costs no re-raking.
 */
export const JACKKNIFE_BELOW = 100;

function needsJackknife(cells: readonly OutcomeRakingCell[]): boolean {
  const yes = cells.reduce((s, c) => s + c.successes, 0);
  const no = cells.reduce((s, c) => s + answeredOf(c), 0) - yes;
  return Math.min(yes, no) < JACKKNIFE_BELOW;
}
