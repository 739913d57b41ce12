import { parseArgs } from 'node:util';
import { allocateQuotas } from '../estimation/quotas.js';
import { CliInputError } from './errors.js';
import { readTargets } from './targets-file.js';
import { integerOption, required } from './values.js';

export const QUOTAS_USAGE = 'plumbline quotas --targets FILE.csv --total N [--interlock VAR,VAR...]';

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
  const known = new Set(targets.targets.map((t) => t.variable));
  const seen = new Set<string>();
  for (const name of interlock) {
    if (!known.has(name)) throw new CliInputError(`--interlock: variable "${name}" is not in ${targets.file}`);
    if (seen.has(name)) throw new CliInputError(`--interlock: variable "${name}" is named twice`);
    seen.add(name);
  }
  return allocateQuotas(targets.targets, total, { interlock });
}
