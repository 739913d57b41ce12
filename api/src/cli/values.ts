import { parseNumber } from '../formats/numbers.js';
import { CliInputError } from './errors.js';

export { parseNumber };

export function numberOption(value: string | undefined, name: string, check: (x: number) => boolean, rule: string): number | undefined {
  if (value === undefined) return undefined;
  const x = parseNumber(value);
  if (x === null || !check(x)) throw new CliInputError(`--${name} "${value}" is not valid: it must be ${rule}`);
  return x;
}

export function integerOption(value: string | undefined, name: string, min: number): number | undefined {
  return numberOption(value, name, (x) => Number.isInteger(x) && x >= min, `a whole number of at least ${min}`);
}

export function required<T>(value: T | undefined, name: string): T {
  if (value === undefined) throw new CliInputError(`--${name} is required`);
  return value;
}

/** Short name of a file for messages: the path as the user typed it. */
export const quote = (s: string): string => JSON.stringify(s);
