import { EstimationInputError } from './errors.js';
import { normaliseShares } from './raking-cells.js';
import { JOINT_SEPARATOR, jointParts } from './joint-names.js';
import type { MarginTarget } from './raking.js';


/**
 * Joint targets of interlocked variables (docs/methods.md, section 5). A target whose
 * variable is written "age band × sex" gives the joint population shares of those variables,
 * its categories "18-24 × female" one category of each; census tables usually give age × sex
 * this way. Weighting rakes to the joint table as one variable, and the variables' own
 * margins are taken from it.
 */
/** Largest gap allowed between a margin given on its own and the joint table's (0.5 points). */
export const MARGIN_TOLERANCE = 0.005;

export interface ResolvedTargets {
  /** What raking works on: plain margins, and each joint table as one variable (with `parts`). */
  raking: MarginTarget[];
  /** Every real variable's margin (normalised shares), joint ones summed from their table. */
  margins: MarginTarget[];
  /** The joint tables, normalised, with their parts. */
  joint: MarginTarget[];
}

/**
 * Separates joint tables from plain margins and checks they agree: every combination of the
 * parts' categories is given (0 for none), no variable is in two joint tables, and a margin
 * also given on its own matches the joint table's within 0.5 points (raking to inconsistent
 * targets never converges). Targets without a joint table come back unchanged.
 */
export function resolveTargets(targets: readonly MarginTarget[]): ResolvedTargets {
  const joint: MarginTarget[] = [];
  const derived = new Map<string, MarginTarget>();
  for (const t of targets) {
    const parts = t.parts ? [...t.parts] : jointParts(t.variable);
    if (!parts) continue;
    const table = checkJoint({ ...t, parts }, parts);
    joint.push(table);
    for (const part of parts) {
      if (derived.has(part)) throw new EstimationInputError(`variable ${part} is in two joint tables; interlock each variable once`);
      derived.set(part, marginOf(table, part));
    }
  }
  if (joint.length === 0) return { raking: [...targets], margins: [...targets], joint };
  for (const t of targets) {
    const fromJoint = derived.get(t.variable);
    if (fromJoint) checkAgreement(t, fromJoint, joint.find((j) => j.parts?.includes(t.variable)) as MarginTarget);
  }
  const margins: MarginTarget[] = [];
  const raking: MarginTarget[] = [];
  for (const t of targets) {
    const table = joint.find((j) => j.variable === t.variable);
    if (table) {
      raking.push(table);
      for (const part of table.parts ?? []) if (!targets.some((o) => o.variable === part)) margins.push(derived.get(part) as MarginTarget);
    } else if (derived.has(t.variable)) {
      margins.push(derived.get(t.variable) as MarginTarget);
    } else {
      raking.push(t);
      margins.push(t);
    }
  }
  return { raking, margins, joint };
}

function checkJoint(t: MarginTarget, parts: string[]): MarginTarget {
  if (new Set(parts).size !== parts.length || parts.some((p) => p === '')) {
    throw new EstimationInputError(`variable ${t.variable}: a joint table names each of its variables once, joined by "${JOINT_SEPARATOR.trim()}"`);
  }
  const shares = normaliseShares(t);
  const levels: string[][] = parts.map(() => []);
  // Each category's parts, read once: "18-24 × female" → ["18-24", "female"].
  const split = t.shares.map((s) => s.category.split(JOINT_SEPARATOR).map((c) => c.trim()));
  for (const [i, s] of t.shares.entries()) {
    const values = split[i] as string[];
    if (values.length !== parts.length || values.some((c) => c === '')) {
      throw new EstimationInputError(
        `variable ${t.variable}: category "${s.category}" must name one category of each of ${parts.join(', ')}, joined by "${JOINT_SEPARATOR.trim()}"`,
      );
    }
    values.forEach((c, v) => {
      const list = levels[v] as string[];
      if (!list.includes(c)) list.push(c);
    });
  }
  const given = new Set(split.map((values) => values.join(JOINT_SEPARATOR)));
  const combinations = levels.reduce<string[][]>((acc, list) => acc.flatMap((prefix) => list.map((c) => [...prefix, c])), [[]]);
  const missing = combinations.find((c) => !given.has(c.join(JOINT_SEPARATOR)));
  if (missing) {
    throw new EstimationInputError(`variable ${t.variable}: no share for "${missing.join(JOINT_SEPARATOR)}"; give every combination (0 where there is none)`);
  }
  return {
    variable: parts.join(JOINT_SEPARATOR),
    parts,
    shares: split.map((values, i) => ({ category: values.join(JOINT_SEPARATOR), share: shares[i] as number })),
  };
}

/** The margin of one variable of a joint table (its shares summed over the other variables). */
export function marginOf(table: MarginTarget, part: string): MarginTarget {
  const v = table.parts?.indexOf(part) ?? -1;
  if (v < 0) throw new EstimationInputError(`variable ${part} is not in the joint table ${table.variable}`);
  const totals = new Map<string, number>();
  for (const s of table.shares) {
    const category = s.category.split(JOINT_SEPARATOR)[v] as string;
    totals.set(category, (totals.get(category) ?? 0) + s.share);
  }
  return { variable: part, shares: [...totals].map(([category, share]) => ({ category, share })) };
}

function checkAgreement(own: MarginTarget, fromJoint: MarginTarget, table: MarginTarget): void {
  const shares = normaliseShares(own);
  const joint = new Map(fromJoint.shares.map((s) => [s.category, s.share]));
  own.shares.forEach((s) => {
    if (!joint.has(s.category)) {
      throw new EstimationInputError(`variable ${own.variable}: category "${s.category}" is not in the joint table ${table.variable}`);
    }
  });
  for (const category of joint.keys()) {
    if (!own.shares.some((s) => s.category === category)) {
      throw new EstimationInputError(`variable ${own.variable}: category "${category}" is in the joint table ${table.variable} but not among its own targets`);
    }
  }
  own.shares.forEach((s, i) => {
    const a = shares[i] as number;
    const b = joint.get(s.category) as number;
    if (Math.abs(a - b) > MARGIN_TOLERANCE) {
      throw new EstimationInputError(
        `variable ${own.variable} category "${s.category}": its own target is ${(a * 100).toFixed(1)}% but the joint table ` +
          `${table.variable} gives ${(b * 100).toFixed(1)}%; they differ by more than 0.5 points, and weighting to both would never ` +
          'converge. Correct one of them, or leave out the separate margin.',
      );
    }
  });
}
