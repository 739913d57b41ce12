import { parseArgs } from 'node:util';
import { betaPosterior } from '../estimation/beta-posterior.js';
import { CliInputError } from './errors.js';
import { integerOption, numberOption, parseNumber, required } from './values.js';

export const POSTERIOR_USAGE = 'plumbline posterior --successes K --trials N [--prior A,B] [--level L]';

/** Beta posterior for a share from k successes in n trials. */
export function posteriorCommand(args: string[]): object {
  const { values } = parseArgs({
    args,
    strict: true,
    options: { successes: { type: 'string' }, trials: { type: 'string' }, prior: { type: 'string' }, level: { type: 'string' } },
  });
  const successes = required(integerOption(values.successes, 'successes', 0), 'successes');
  const trials = required(integerOption(values.trials, 'trials', 0), 'trials');
  if (successes > trials) throw new CliInputError(`--successes ${successes} is more than --trials ${trials}`);
  const level = numberOption(values.level, 'level', (x) => x > 0 && x < 1, 'a number strictly between 0 and 1');
  return betaPosterior(successes, trials, { prior: parsePrior(values.prior, '--prior'), level });
}

export function parsePrior(text: string | undefined, where: string): [number, number] | undefined {
  if (text === undefined) return undefined;
  const parts = text.split(',').map(parseNumber);
  const [a, b] = parts;
  if (parts.length !== 2 || a == null || b == null || !(a > 0 && b > 0 && Number.isFinite(a) && Number.isFinite(b))) {
    throw new CliInputError(`${where} "${text}" is not valid: it must be two positive numbers A,B`);
  }
  return [a, b];
}
