const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** A decimal number written in plain or scientific notation; anything else is null. */
export function parseNumber(text: string): number | null {
  const t = text.trim();
  return NUMBER.test(t) ? Number(t) : null;
}

/**
 * The largest share accepted, in a file and in the API alike. Shares may be counts (a census
 * table's persons), so the bound is generous, but a sum of thousands of them stays far inside a
 * double, where 1e308 + 1e308 is Infinity.
 */
export const MAX_SHARE = 1e12;
