// Every command loaded at once, for running `plumbline` in-process (the tests). The binary
// goes through command-loaders.ts instead, which loads only the command it runs.
import { dispatch, type Command, type Output } from './dispatch.js';
import { ORG_USAGE, orgCommand } from './org-command.js';
import { POSTERIOR_USAGE, posteriorCommand } from './posterior-command.js';
import { QUALITY_CHECK_USAGE, qualityCheckCommand } from './quality-check-command.js';
import { QUOTAS_USAGE, quotasCommand } from './quotas-command.js';
import { RATES_USAGE, ratesCommand } from './rates-command.js';
import { RECONCILE_USAGE, reconcileCommand } from './reconcile-command.js';
import { WEIGHT_USAGE, weightCommand } from './weight-command.js';

export type { Output } from './dispatch.js';

const COMMANDS: Readonly<Record<string, Command>> = {
  weight: { usage: WEIGHT_USAGE, run: weightCommand },
  posterior: { usage: POSTERIOR_USAGE, run: posteriorCommand },
  reconcile: { usage: RECONCILE_USAGE, run: reconcileCommand },
  rates: { usage: RATES_USAGE, run: ratesCommand },
  quotas: { usage: QUOTAS_USAGE, run: quotasCommand },
  'quality-check': { usage: QUALITY_CHECK_USAGE, run: qualityCheckCommand },
  org: { usage: ORG_USAGE, run: orgCommand },
};

/** Runs one `plumbline` file command; the exit codes are those of `dispatch`. */
export function run(argv: string[], io: Output): number {
  const code = dispatch(argv, io, COMMANDS);
  if (typeof code !== 'number') throw new Error(`plumbline ${argv[0]} works on the database and answers later: call runAsync`);
  return code;
}

/** Runs any `plumbline` command, including those that work on the database (`org`). */
export async function runAsync(argv: string[], io: Output): Promise<number> {
  return dispatch(argv, io, COMMANDS);
}
