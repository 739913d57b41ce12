import { EstimationInputError } from './errors.js';
import { normaliseShares } from './raking-cells.js';
import { JOINT_SEPARATOR } from './joint-names.js';
import { resolveTargets } from './joint-targets.js';
import type { MarginTarget } from './raking.js';

export interface QuotaCell {
  categories: Record<string, string>;
  /** Exact expected count: total × product of the shares. */
  expected: number;
  /** Whole-number target. */
  target: number;
}

/** One set of cells whose targets add up to the total: an interlocked cross, or one variable's margin. */
export interface QuotaSet {
  variables: string[];
  cells: QuotaCell[];
}

export interface QuotaAllocation {
  total: number;
  sets: QuotaSet[];
}

/**
 * Largest-remainder (Hamilton) apportionment: every value is rounded down, then the units
 * still missing go to the largest remainders (ties to the earlier entry). The result sums
 * to `total` and each entry is within one of its exact value.
 */
export function largestRemainder(expected: readonly number[], total: number): number[] {
  const floors = expected.map((x) => Math.floor(x));
  const missing = total - floors.reduce((a, b) => a + b, 0);
  const order = expected
    .map((x, i) => ({ i, remainder: x - (floors[i] as number) }))
    .sort((a, b) => b.remainder - a.remainder || a.i - b.i);
  for (let r = 0; r < missing; r++) {
    const pick = order[r % order.length] as { i: number };
    floors[pick.i] = (floors[pick.i] as number) + 1;
  }
  return floors;
}

/**
 * Quota targets for a total sample size: the interlocked variables form one cross whose cell
 * shares are the joint table's when one is given (joint-targets.ts) and otherwise the products
 * of their shares (independence of the margins); every other variable gets margin quotas.
 * A joint table interlocks its variables by itself. Each set is rounded by largest remainder
 * (see `largestRemainder`). docs/methods.md, section 5.
 */
export function allocateQuotas(
  variables: readonly MarginTarget[],
  total: number,
  options: { interlock?: readonly string[] } = {},
): QuotaAllocation {
  if (!(Number.isInteger(total) && total > 0)) throw new EstimationInputError('total must be a whole number above 0');
  if (variables.length === 0) throw new EstimationInputError('no quota variables given');
  const seen = new Set<string>();
  for (const v of variables) {
    if (seen.has(v.variable)) throw new EstimationInputError(`variable ${v.variable} is given twice`);
    seen.add(v.variable);
  }
  const { margins, joint } = resolveTargets(variables);
  if (joint.length > 1) throw new EstimationInputError(`joint tables are given for ${joint.map((j) => j.variable).join(' and ')}; a project interlocks one set of variables`);
  const table = joint[0];
  const byName = new Map(margins.map((m) => [m.variable, m]));
  let interlock = [...(options.interlock ?? [])];
  if (new Set(interlock).size !== interlock.length) throw new EstimationInputError('interlock names a variable twice');
  for (const name of interlock) if (!byName.has(name)) throw new EstimationInputError(`interlock: variable ${name} is not in the targets`);
  if (table) {
    const parts = [...(table.parts ?? [])];
    if (interlock.length > 0 && (interlock.length !== parts.length || interlock.some((name) => !parts.includes(name)))) {
      throw new EstimationInputError(`interlock: the joint table interlocks ${parts.join(', ')}; interlock exactly those, or give their margins instead of the table`);
    }
    interlock = parts;
  }
  const sets: QuotaSet[] = [];
  if (table) sets.push(allocateShares(interlock, crossOf(table), total));
  else if (interlock.length > 0) sets.push(allocateSet(interlock.map((name) => byName.get(name) as MarginTarget), total));
  for (const v of margins) if (!interlock.includes(v.variable)) sets.push(allocateSet([v], total));
  return { total, sets };
}

/** A joint table's cells as category records with their (normalised) shares. */
function crossOf(table: MarginTarget): { categories: Record<string, string>; share: number }[] {
  const parts = table.parts ?? [];
  return table.shares.map((s) => {
    const values = s.category.split(JOINT_SEPARATOR);
    return { categories: Object.fromEntries(parts.map((p, v) => [p, values[v] as string])), share: s.share };
  });
}

function allocateSet(variables: MarginTarget[], total: number): QuotaSet {
  let cells: { categories: Record<string, string>; share: number }[] = [{ categories: {}, share: 1 }];
  for (const v of variables) {
    const shares = normaliseShares(v);
    cells = cells.flatMap((cell) =>
      v.shares.map((s, i) => ({ categories: { ...cell.categories, [v.variable]: s.category }, share: cell.share * (shares[i] as number) })),
    );
  }
  return allocateShares(variables.map((v) => v.variable), cells, total);
}

function allocateShares(variables: string[], cells: { categories: Record<string, string>; share: number }[], total: number): QuotaSet {
  const expected = cells.map((c) => c.share * total);
  const targets = largestRemainder(expected, total);
  return {
    variables,
    cells: cells.map((c, i) => ({ categories: c.categories, expected: expected[i] as number, target: targets[i] as number })),
  };
}
