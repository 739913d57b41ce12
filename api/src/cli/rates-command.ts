import { parseArgs } from 'node:util';
import { DISPOSITION_CODES, outcomeRates, type DispositionCode } from '../estimation/outcome-rates.js';
import { EstimationInputError } from '../estimation/errors.js';
import { readCsv } from './csv-files.js';
import { CliInputError } from './errors.js';
import { numberOption, parseNumber, required } from './values.js';

export const RATES_USAGE = 'plumbline rates --input FILE.csv [--e VALUE]';

/** AAPOR outcome rates from a code,count file of final dispositions. */
export function ratesCommand(args: string[]): object {
  const { values } = parseArgs({ args, strict: true, options: { input: { type: 'string' }, e: { type: 'string' } } });
  const file = required(values.input, 'input');
  const e = numberOption(values.e, 'e', (x) => x >= 0 && x <= 1, 'a number between 0 and 1');
  const table = readCsv(file, ['code', 'count']);
  const [ic, in_] = [table.header.indexOf('code'), table.header.indexOf('count')];
  const counts: Partial<Record<DispositionCode, number>> = {};
  const lines = new Map<string, number>();
  for (let i = 0; i < table.rowCount; i++) {
    const record = table.row(i);
    const line = table.line(i);
    const code = (record[ic] ?? '').trim().toUpperCase();
    if (!(DISPOSITION_CODES as readonly string[]).includes(code)) {
      throw new CliInputError(`${file}: line ${line}: code "${record[ic]}" is not one of ${DISPOSITION_CODES.join(', ')}`);
    }
    if (lines.has(code)) throw new CliInputError(`${file}: line ${line}: code ${code} is given twice (first on line ${lines.get(code)})`);
    lines.set(code, line);
    const count = parseNumber(record[in_] ?? '');
    if (count === null || count < 0) throw new CliInputError(`${file}: line ${line}: count "${record[in_]}" for ${code} is not a non-negative number`);
    counts[code as DispositionCode] = count;
  }
  try {
    return outcomeRates(counts, e);
  } catch (error) {
    if (error instanceof EstimationInputError) throw new CliInputError(`${file}: ${error.message}`);
    throw error;
  }
}
