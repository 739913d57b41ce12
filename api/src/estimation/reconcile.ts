import { jStat } from './jstat.js';
import { chanceOutlierProbability } from './beta-binomial.js';
import { checkCounts, checkPrior } from './beta-posterior.js';
import { EstimationInputError } from './errors.js';
import { expit, logit } from './bias-factor.js';
import { GridDensity, massRange } from './grid.js';
import { runPass, type GroupModel, type PassResult } from './reconcile-pass.js';

export type BiasSpec =
  | { kind: 'none' }
  | { kind: 'known'; factor: number }
  | { kind: 'unknown'; mean?: number; spread?: number };

export interface MethodGroup {
  id: string;
  bias: BiasSpec;
}

export interface BenchmarkPoll {
  id: string;
  group: string;
  successes: number;
  trials: number;
}

export interface ReconcileInput {
  /** Beta prior on the true share; uniform by default. */
  prior?: readonly [number, number];
  groups: readonly MethodGroup[];
  polls: readonly BenchmarkPoll[];
}

export interface ShareSummary {
  mean: number;
  median: number;
  lower: number;
  upper: number;
}

export interface GroupFactor {
  id: string;
  meanFactor: number;
  lower: number;
  upper: number;
  /** P(b > 0.5): the group's polls overstate the share. */
  probOverstates: number;
  probUnderstates: number;
}

export interface Reconciliation {
  truth: ShareSummary;
  groups: GroupFactor[];
  polls: { id: string; chanceOutlierProbability: number }[];
}

export const DEFAULT_SPREAD = 0.04;


/** Grid sizes per pass (true share, each unknown bias factor): the first passes find where the mass is. */
const PASSES: readonly [number, number][] = [[401, 301], [401, 301], [801, 401], [1201, 801]];

/**
 * Reconciliation of polls with method-group bias factors. Model: p ~ Beta prior; group g has
 * bias factor b_g (none: 0.5; known: fixed; unknown: Beta with the stated mean and standard
 * deviation, by the method of moments); poll i in group g has k_i ~ Binomial(n_i, q) with
 * logit q = logit p + logit b_g.
 *
 * Solved by deterministic quadrature, no sampling: on a grid in logit p, each unknown group
 * contributes the one-dimensional integral over logit b_g of prior × likelihood (given p the
 * groups are independent), all by the composite trapezoid rule. Grids are re-centred on the
 * posterior mass over several passes, so results are identical on every run.
 * Chance-outlier probabilities use the beta-binomial predictive from all other polls.
 * docs/methods.md, sections 8 and 9.
 */
export function reconcile(input: ReconcileInput, options: { level?: number } = {}): Reconciliation {
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new EstimationInputError('level must lie strictly between 0 and 1');
  const prior = input.prior ?? [1, 1];
  checkPrior(prior[0], prior[1]);
  const models = buildModels(input);
  const unknown = models.filter((m) => m.fixedLogit === null);

  let xRange: [number, number] = [-30, 30];
  let bRanges = unknown.map((m) => priorLogitRange(m));
  let final: PassResult | null = null;
  for (const [nx, nb] of PASSES) {
    final = runPass(prior, models, unknown, xRange, bRanges, nx, nb);
    xRange = massRange(final.xs, final.logPost);
    bRanges = final.bMarginals.map((b) => massRange(b.grid, b.logDensity));
  }
  const result = final as PassResult;
  const tail = (1 - level) / 2;
  const truth = new GridDensity(result.xs, result.logPost);
  const summaries = new Map<string, GroupFactor>();
  unknown.forEach((m, g) => {
    const marginal = result.bMarginals[g] as { grid: Float64Array; logDensity: Float64Array };
    const density = new GridDensity(marginal.grid, marginal.logDensity);
    const below = density.cdf(0);
    summaries.set(m.id, {
      id: m.id,
      meanFactor: density.expectation(expit),
      lower: expit(density.quantile(tail)),
      upper: expit(density.quantile(1 - tail)),
      probOverstates: 1 - below,
      probUnderstates: below,
    });
  });

  const totalK = input.polls.reduce((s, p) => s + p.successes, 0);
  const totalN = input.polls.reduce((s, p) => s + p.trials, 0);
  return {
    truth: {
      mean: truth.expectation(expit),
      median: expit(truth.quantile(0.5)),
      lower: expit(truth.quantile(tail)),
      upper: expit(truth.quantile(1 - tail)),
    },
    groups: models.map((m) => summaries.get(m.id) ?? fixedSummary(m)),
    polls: input.polls.map((p) => ({
      id: p.id,
      chanceOutlierProbability: chanceOutlierProbability(p, { successes: totalK - p.successes, trials: totalN - p.trials }, prior),
    })),
  };
}

function fixedSummary(m: GroupModel): GroupFactor {
  const b = expit(m.fixedLogit as number);
  return { id: m.id, meanFactor: b, lower: b, upper: b, probOverstates: b > 0.5 ? 1 : 0, probUnderstates: b < 0.5 ? 1 : 0 };
}

function buildModels(input: ReconcileInput): GroupModel[] {
  if (input.groups.length === 0) throw new EstimationInputError('groups: at least one method group is needed');
  if (input.polls.length === 0) throw new EstimationInputError('polls: at least one poll is needed');
  const models = new Map<string, GroupModel>();
  input.groups.forEach((g, i) => {
    if (models.has(g.id)) throw new EstimationInputError(`groups[${i}]: id "${g.id}" is given twice`);
    models.set(g.id, groupModel(g, i));
  });
  const pollIds = new Set<string>();
  input.polls.forEach((p, i) => {
    if (pollIds.has(p.id)) throw new EstimationInputError(`polls[${i}]: id "${p.id}" is given twice`);
    pollIds.add(p.id);
    const model = models.get(p.group);
    if (!model) throw new EstimationInputError(`polls[${i}] ("${p.id}"): group "${p.group}" is not among the groups`);
    checkCounts(p.successes, p.trials, `polls[${i}] ("${p.id}"): `);
    if (p.trials === 0) throw new EstimationInputError(`polls[${i}] ("${p.id}"): trials must be at least 1`);
    model.k += p.successes;
    model.n += p.trials;
  });
  return [...models.values()];
}

function groupModel(g: MethodGroup, i: number): GroupModel {
  const base = { id: g.id, k: 0, n: 0, alpha: 0, beta: 0 };
  const where = `groups[${i}] ("${g.id}")`;
  switch (g.bias?.kind) {
    case 'none':
      return { ...base, fixedLogit: 0 };
    case 'known':
      if (!(g.bias.factor > 0 && g.bias.factor < 1)) throw new EstimationInputError(`${where}: factor must lie strictly between 0 and 1`);
      return { ...base, fixedLogit: logit(g.bias.factor) };
    case 'unknown': {
      const mean = g.bias.mean ?? 0.5;
      const spread = g.bias.spread ?? DEFAULT_SPREAD;
      if (!(mean > 0 && mean < 1)) throw new EstimationInputError(`${where}: mean must lie strictly between 0 and 1`);
      const nu = (mean * (1 - mean)) / (spread * spread) - 1;
      if (!(spread > 0 && nu > 0)) {
        throw new EstimationInputError(`${where}: spread must be above 0 and below √(mean·(1−mean)) = ${Math.sqrt(mean * (1 - mean)).toFixed(4)}`);
      }
      return { ...base, fixedLogit: null, alpha: mean * nu, beta: (1 - mean) * nu };
    }
    default:
      throw new EstimationInputError(`${where}: bias.kind must be "none", "known" or "unknown"`);
  }
}

function priorLogitRange(m: GroupModel): [number, number] {
  const lo = logit(Math.max(1e-300, jStat.beta.inv(1e-13, m.alpha, m.beta)));
  const hi = logit(Math.min(1 - 1e-16, jStat.beta.inv(1 - 1e-13, m.alpha, m.beta)));
  return [Math.max(-30, Number.isFinite(lo) ? lo : -30), Math.min(30, Number.isFinite(hi) ? hi : 30)];
}
