import { kishDesignEffect } from './design-effect.js';
import { EstimationInputError } from './errors.js';
import { resolveTargets } from './joint-targets.js';
import { rake, type MarginTarget, type RakingCell, type RakingOptions } from './raking.js';

/** A quota cell as the supervisor sees it: the categories that define it, its target and its count. */
export interface EffortQuotaCell {
  id: string;
  label: string;
  categories: Readonly<Record<string, string>>;
  target: number;
  achieved: number;
  /** A closed cell takes no more interviews. */
  closed?: boolean;
}

export interface CellGain {
  id: string;
  label: string;
  target: number;
  achieved: number;
  /** Interviews still wanted (target − achieved, at least 0). */
  remaining: number;
  /** Change in Kish's effective sample size from one more interview here. */
  gain: number;
  /** Change in Kish's design effect from one more interview here; above 0 it costs precision per interview. */
  designEffectChange: number;
}

export interface PlannedCell {
  id: string;
  label: string;
  interviews: number;
}

export interface NextInterviews {
  n: number;
  effectiveSampleSize: number;
  designEffect: number;
  /** Open cells, best first, by the gain of one more interview now. */
  ranking: CellGain[];
  /** The next `count` interviews chosen one at a time, most interviews first. */
  plan: PlannedCell[];
  /** Interviews in the plan: fewer than asked when the open cells have less room. */
  planned: number;
  /** Kish's effective sample size once the plan is done. */
  effectiveSampleSizeAfter: number;
  /** Cells at or over target where one more interview raises the design effect, costliest first. */
  costly: CellGain[];
}

/** Raking is re-run many times on nearby samples; tight tolerance keeps the gains comparable. */
const RAKING: RakingOptions = { tolerance: 1e-10, maxIterations: 2000 };

type Sample = Map<string, RakingCell>;

const keyOf = (categories: Readonly<Record<string, string>>): string =>
  JSON.stringify(Object.entries(categories).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));

/** Kish's n_eff and deff of the raked weights of a sample of aggregated cells. */
function kishOf(sample: Sample, targets: readonly MarginTarget[]): { effectiveSampleSize: number; designEffect: number } {
  const cells = [...sample.values()];
  const { weights } = rake(cells, targets, RAKING);
  const { effectiveSampleSize, designEffect } = kishDesignEffect(weights, cells.map((c) => c.count));
  return { effectiveSampleSize, designEffect };
}

/**
 * One more interview in a quota cell, spread over the weighting cells inside it in proportion
 * to their counts now; a quota cell with no interviews yet takes the mix of the other
 * variables over the whole sample.
 */
function withOneMore(sample: Sample, quota: EffortQuotaCell): Sample {
  const cells = [...sample.values()];
  const inside = cells.filter((c) => Object.entries(quota.categories).every(([v, cat]) => c.categories[v] === cat));
  const source = inside.length > 0 ? inside : cells;
  const total = source.reduce((s, c) => s + c.count, 0);
  const next: Sample = new Map([...sample].map(([k, c]) => [k, { ...c }]));
  for (const c of source) {
    const categories = { ...c.categories, ...quota.categories };
    const key = keyOf(categories);
    const cell = next.get(key) ?? { categories, count: 0 };
    cell.count += c.count / total;
    next.set(key, cell);
  }
  return next;
}

function checkInput(cells: readonly RakingCell[], quotaCells: readonly EffortQuotaCell[], count: number): void {
  if (!(Number.isInteger(count) && count >= 1)) throw new EstimationInputError('count must be a whole number of at least 1');
  const variables = new Set(cells.flatMap((c) => Object.keys(c.categories)));
  for (const q of quotaCells) {
    for (const v of Object.keys(q.categories)) {
      if (!variables.has(v)) throw new EstimationInputError(`quota cell ${q.label}: variable ${v} is not among the weighting variables`);
    }
    if (!(Number.isFinite(q.target) && q.target >= 0 && Number.isFinite(q.achieved) && q.achieved >= 0)) {
      throw new EstimationInputError(`quota cell ${q.label}: target and achieved must be non-negative numbers`);
    }
  }
}

/**
 * Where the next interviews raise the effective sample size most. Each open quota cell is
 * scored by Kish's effective sample size n_eff = (Σw)² / Σw² (Kish 1965) after one more
 * interview there, the weights re-raked (Deming and Stephan 1940) on the aggregated cells;
 * the plan takes the best cell, adds the interview, and repeats `count` times (a greedy
 * allocation, as in sequential optimum allocation; common practice). Cells at or over their
 * target whose next interview would raise the design effect are listed beside it.
 * docs/methods.md, section "Where the next interviews help most".
 */
export function nextInterviews(
  cells: readonly RakingCell[],
  targets: readonly MarginTarget[],
  quotaCells: readonly EffortQuotaCell[],
  count: number,
): NextInterviews {
  checkInput(cells, quotaCells, count);
  const raking = resolveTargets(targets).raking;
  let sample: Sample = new Map();
  for (const c of cells) {
    if (c.count <= 0) continue;
    const key = keyOf(c.categories);
    const cell = sample.get(key) ?? { categories: { ...c.categories }, count: 0 };
    cell.count += c.count;
    sample.set(key, cell);
  }
  const now = kishOf(sample, raking);
  const n = [...sample.values()].reduce((s, c) => s + c.count, 0);
  const gainOf = (q: EffortQuotaCell): CellGain => {
    const after = kishOf(withOneMore(sample, q), raking);
    return {
      id: q.id, label: q.label, target: q.target, achieved: q.achieved,
      remaining: Math.max(0, q.target - q.achieved),
      gain: after.effectiveSampleSize - now.effectiveSampleSize,
      designEffectChange: after.designEffect - now.designEffect,
    };
  };
  const open = quotaCells.filter((q) => !q.closed && q.achieved < q.target);
  const ranking = open.map(gainOf).sort((a, b) => b.gain - a.gain);
  const costly = quotaCells
    .filter((q) => q.achieved >= q.target)
    .map(gainOf)
    .filter((g) => g.designEffectChange > 0)
    .sort((a, b) => b.designEffectChange - a.designEffectChange);

  const taken = new Map<string, number>();
  const order: string[] = [];
  let after = now.effectiveSampleSize;
  for (let step = 0; step < count; step++) {
    let best: { q: EffortQuotaCell; sample: Sample; size: number } | null = null;
    for (const q of open) {
      if ((taken.get(q.id) ?? 0) >= q.target - q.achieved) continue;
      const next = withOneMore(sample, q);
      const size = kishOf(next, raking).effectiveSampleSize;
      if (best === null || size > best.size) best = { q, sample: next, size };
    }
    if (best === null) break;
    sample = best.sample;
    after = best.size;
    if (!taken.has(best.q.id)) order.push(best.q.id);
    taken.set(best.q.id, (taken.get(best.q.id) ?? 0) + 1);
  }
  const labelOf = new Map(quotaCells.map((q) => [q.id, q.label]));
  const plan = order
    .map((id, i) => ({ id, label: labelOf.get(id) as string, interviews: taken.get(id) as number, i }))
    .sort((a, b) => b.interviews - a.interviews || a.i - b.i)
    .map(({ id, label, interviews }) => ({ id, label, interviews }));
  return {
    n,
    effectiveSampleSize: now.effectiveSampleSize,
    designEffect: now.designEffect,
    ranking,
    plan,
    planned: plan.reduce((s, p) => s + p.interviews, 0),
    effectiveSampleSizeAfter: after,
    costly,
  };
}
