import { logit, withInterval, type ImpliedBiasFactor, type OutcomeCell } from './bias-factor.js';
import { EstimationInputError } from './errors.js';
import { answeredOf } from './linearised-share.js';
import { rake, type MarginTarget, type RakingCell, type RakingOptions } from './raking.js';

/**
 * Implied bias factor with a delete-one jackknife interval (Quenouille 1956; Wolter 2007,
 * Introduction to Variance Estimation, ch. 4) on aggregated cells. Deleting any one interview
 * of a cell with the same answer gives the same re-raked sample, so the n deletions collapse
 * to at most three per cell (yes, no, and don't know or no answer: those are raked too, so
deleting one moves the weights), each re-raked to the targets: with m_g
 * interviews behind deletion g and θ_g = logit(b) without one of them,
 *   θ̄ = Σ m_g θ_g / n,  Var = (n−1)/n · Σ m_g (θ_g − θ̄)²,
 * and the interval is logit(b) ± z·√Var mapped back through the logistic function.
 * Deterministic and at most three times the number of cells re-rakes (docs/methods.md, section 6).
 * The standard error is null when a deletion leaves a category without interviews or the
 * outcome without variation: such samples have their intervals withheld anyway.
 */
export function jackknifeBiasFactor(
  cells: readonly (RakingCell & OutcomeCell)[],
  targets: readonly MarginTarget[],
  options: RakingOptions = {},
  level = 0.95,
): ImpliedBiasFactor {
  const full = shares(cells, rake(cells, targets, options).weights);
  const { u, w, n } = full;
  if (!(n > 1)) throw new EstimationInputError('at least two weighted interviews are needed');
  if (!(u > 0 && u < 1 && w > 0 && w < 1)) return { unweighted: u, weighted: w, factor: null, lower: null, upper: null, standardError: null };
  const replicates: { size: number; theta: number }[] = [];
  for (const [j, cell] of cells.entries()) {
    const answered = answeredOf(cell);
    const deletions = [
      { size: cell.successes, yes: 1, answered: 1 },
      { size: answered - cell.successes, yes: 0, answered: 1 },
      { size: cell.count - answered, yes: 0, answered: 0 },
    ];
    for (const d of deletions) {
      const size = d.size;
      if (size === 0) continue;
      const without = cells.map((c, i) =>
        i === j ? { ...c, count: c.count - 1, successes: c.successes - d.yes, answered: answered - d.answered } : c,
      );
      let replicate: { u: number; w: number };
      try {
        replicate = shares(without, rake(without, targets, options).weights);
      } catch (error) {
        if (error instanceof EstimationInputError) return nullInterval(u, w);
        throw error;
      }
      if (!(replicate.u > 0 && replicate.u < 1 && replicate.w > 0 && replicate.w < 1)) return nullInterval(u, w);
      replicates.push({ size, theta: logit(replicate.u) - logit(replicate.w) });
    }
  }
  const mean = replicates.reduce((s, r) => s + r.size * r.theta, 0) / n;
  const variance = ((n - 1) / n) * replicates.reduce((s, r) => s + r.size * (r.theta - mean) ** 2, 0);
  return withInterval(u, w, Math.sqrt(variance), level);
}

function nullInterval(u: number, w: number): ImpliedBiasFactor {
  return { ...withInterval(u, w, 0), lower: null, upper: null, standardError: null };
}

/** Unweighted and weighted shares of yes among those who answered yes or no; n counts everyone raked. */
function shares(cells: readonly OutcomeCell[], weights: readonly number[]): { u: number; w: number; n: number } {
  let n = 0;
  let a = 0;
  let k = 0;
  let total = 0;
  let yes = 0;
  cells.forEach((c, j) => {
    const weight = weights[j] as number;
    n += c.count;
    a += answeredOf(c);
    k += c.successes;
    total += answeredOf(c) * weight;
    yes += c.successes * weight;
  });
  return { u: k / a, w: yes / total, n };
}
