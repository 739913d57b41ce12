const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** A decimal number written in plain or scientific notation; anything else is null. */
export function parseNumber(text: string): number | null {
  const t = text.trim();
  return NUMBER.test(t) ? Number(t) : null;
}
