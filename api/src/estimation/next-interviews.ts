import { EstimationInputError } from './errors.js';
import { resolveTargets } from './joint-targets.js';
import type { MarginTarget, RakingCell } from './raking.js';
import { kish, WarmRaking } from './warm-raking.js';

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

const keyOf = (categories: Readonly<Record<string, string>>): string =>
  JSON.stringify(Object.entries(categories).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));

const inside = (cell: RakingCell, quota: EffortQuotaCell): boolean =>
  Object.entries(quota.categories).every(([v, category]) => cell.categories[v] === category);

/**
 * The weighting cells, indexed once: the sample's own, and for a quota cell with no interviews
 * yet the combinations its first interview would fall in. One more interview in a quota cell is
 * spread over the weighting cells inside it in proportion to their counts at the time; a quota
 * cell with no interviews takes the mix of the other variables over the sample as it is now.
 */
class Cells {
  readonly list: RakingCell[] = [];
  private readonly index = new Map<string, number>();
  private readonly members = new Map<string, number[]>();
  private readonly firstSpread = new Map<string, { to: number; share: number }[]>();

  constructor(sample: readonly RakingCell[], quotaCells: readonly EffortQuotaCell[]) {
    for (const c of sample) if (c.count > 0) this.add(c.categories, c.count);
    const original = [...this.list];
    const n = original.reduce((s, c) => s + c.count, 0);
    for (const q of quotaCells) {
      if (original.some((c) => inside(c, q))) continue;
      this.firstSpread.set(q.id, original.map((c) => ({ to: this.add({ ...c.categories, ...q.categories }, 0), share: c.count / n })));
    }
    for (const q of quotaCells) this.members.set(q.id, this.list.flatMap((c, j) => (inside(c, q) ? [j] : [])));
  }

  private add(categories: Readonly<Record<string, string>>, count: number): number {
    const key = keyOf(categories);
    let j = this.index.get(key);
    if (j === undefined) {
      j = this.list.length;
      this.index.set(key, j);
      this.list.push({ categories: { ...categories }, count: 0 });
    }
    (this.list[j] as RakingCell).count += count;
    return j;
  }

  counts(): Float64Array {
    return Float64Array.from(this.list, (c) => c.count);
  }

  /** The counts with one more interview in quota cell `q`. */
  withOneMore(counts: Float64Array, q: EffortQuotaCell): Float64Array {
    const next = Float64Array.from(counts);
    const members = this.members.get(q.id) ?? [];
    const total = members.reduce((s, j) => s + (counts[j] as number), 0);
    if (total > 0) for (const j of members) next[j] = (next[j] as number) + (counts[j] as number) / total;
    else for (const { to, share } of this.firstSpread.get(q.id) ?? []) next[to] = (next[to] as number) + share;
    return next;
  }
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
 * Every interview starts from base weight 1 (as in the balance); a cell's baseWeight is not used.
 * docs/methods.md, section "Where the next interviews help most".
 */
export function nextInterviews(
  cells: readonly RakingCell[],
  targets: readonly MarginTarget[],
  quotaCells: readonly EffortQuotaCell[],
  count: number,
): NextInterviews {
  checkInput(cells, quotaCells, count);
  const index = new Cells(cells, quotaCells);
  const raking = new WarmRaking(index.list, resolveTargets(targets).raking);
  let counts = index.counts();
  let weights = raking.weights(counts);
  const now = kish(counts, weights);
  const n = counts.reduce((a, b) => a + b, 0);
  const gainOf = (q: EffortQuotaCell): CellGain => {
    const more = index.withOneMore(counts, q);
    const after = kish(more, raking.weights(more, weights));
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
    let best: { q: EffortQuotaCell; counts: Float64Array; weights: Float64Array; size: number } | null = null;
    for (const q of open) {
      if ((taken.get(q.id) ?? 0) >= q.target - q.achieved) continue;
      const more = index.withOneMore(counts, q);
      const w = raking.weights(more, weights);
      const size = kish(more, w).effectiveSampleSize;
      if (best === null || size > best.size) best = { q, counts: more, weights: w, size };
    }
    if (best === null) break;
    counts = best.counts;
    weights = best.weights;
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
