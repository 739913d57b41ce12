import { CliInputError } from './errors.js';
import { POSTERIOR_USAGE, posteriorCommand } from './posterior-command.js';
import { QUOTAS_USAGE, quotasCommand } from './quotas-command.js';
import { RATES_USAGE, ratesCommand } from './rates-command.js';
import { RECONCILE_USAGE, reconcileCommand } from './reconcile-command.js';
import { WEIGHT_USAGE, weightCommand } from './weight-command.js';

export interface Output {
  out(text: string): void;
  err(text: string): void;
}

const COMMANDS: Record<string, (args: string[]) => object> = {
  weight: weightCommand,
  posterior: posteriorCommand,
  reconcile: reconcileCommand,
  rates: ratesCommand,
  quotas: quotasCommand,
};

const USAGE = ['Usage:', WEIGHT_USAGE, POSTERIOR_USAGE, RECONCILE_USAGE, RATES_USAGE, QUOTAS_USAGE].join('\n  ');

/**
 * Runs one `plumbline` command. Returns the exit code: 0 with one JSON object on stdout,
 * 2 with a one-line reason on stderr for bad input (no output file written), 1 for a fault.
 */
export function run(argv: string[], io: Output): number {
  const [command, ...args] = argv;
  if (command === undefined || command === '--help' || command === 'help') {
    io.out(`${USAGE}\n`);
    return command === undefined ? 2 : 0;
  }
  const handler = COMMANDS[command];
  try {
    if (!handler) throw new CliInputError(`unknown command "${command}" (commands: ${Object.keys(COMMANDS).join(', ')})`);
    const result = handler(args);
    io.out(`${JSON.stringify(result, null, 2)}\n`);
    return 0;
  } catch (error) {
    if (error instanceof CliInputError || isArgumentError(error)) {
      io.err(`plumbline ${command}: ${oneLine((error as Error).message)}\n`);
      return 2;
    }
    io.err(`plumbline ${command}: unexpected failure: ${oneLine(String((error as Error)?.stack ?? error))}\n`);
    return 1;
  }
}

/** Errors node's util.parseArgs raises for unknown or malformed options. */
function isArgumentError(error: unknown): boolean {
  const code = (error as { code?: string })?.code ?? '';
  return code.startsWith('ERR_PARSE_ARGS');
}

const oneLine = (s: string): string => s.replace(/\s*\n\s*/g, ' ').trim();
