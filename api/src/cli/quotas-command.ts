import { parseArgs } from 'node:util';
import { EstimationInputError } from '../estimation/errors.js';
import { allocateQuotas } from '../estimation/quotas.js';
import { CliInputError } from './errors.js';
import { readTargets } from './targets-file.js';
import { integerOption, required } from './values.js';

export const QUOTAS_USAGE = 'plumbline quotas --targets FILE.csv --total N [--interlock VAR,VAR...] (a joint table in the targets interlocks its variables)';

/** Whole-number quota targets that add up to the total, by largest remainder. */
export function quotasCommand(args: string[]): object {
  const { values } = parseArgs({
    args,
    strict: true,
    options: { targets: { type: 'string' }, total: { type: 'string' }, interlock: { type: 'string' } },
  });
  const total = required(integerOption(values.total, 'total', 1), 'total');
  const targets = readTargets(required(values.targets, 'targets'));
  const interlock = values.interlock === undefined ? [] : values.interlock.split(',').map((s) => s.trim());
  const known = new Set(targets.margins.map((t) => t.variable));
  const seen = new Set<string>();
  for (const name of interlock) {
    if (!known.has(name)) throw new CliInputError(`--interlock: variable "${name}" is not in ${targets.file}`);
    if (seen.has(name)) throw new CliInputError(`--interlock: variable "${name}" is named twice`);
    seen.add(name);
  }
  try {
    return allocateQuotas(targets.targets, total, { interlock });
  } catch (error) {
    if (error instanceof EstimationInputError) throw new CliInputError(`${targets.file}: ${error.message}`);
    throw error;
  }
}
