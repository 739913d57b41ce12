import type { MarginTarget } from './raking.js';

/** How a joint table names its variables and categories: "age band × sex", "18-24 × female". */
export const JOINT_SEPARATOR = ' × ';

/** The variables of a joint target ("age band × sex" → ["age band", "sex"]); null for a plain one. */
export function jointParts(variable: string): string[] | null {
  const parts = variable.split(JOINT_SEPARATOR).map((p) => p.trim());
  return parts.length > 1 ? parts : null;
}

/** A cell's category for a target: its own category, or for a joint target its parts' joined. */
export function categoryOf(categories: Readonly<Record<string, string>>, target: MarginTarget): string | undefined {
  const own = categories[target.variable];
  const parts = target.parts ?? (own === undefined ? jointParts(target.variable) : null);
  if (!parts) return own;
  const values = parts.map((p) => categories[p]);
  return values.some((v) => v === undefined) ? undefined : values.join(JOINT_SEPARATOR);
}

