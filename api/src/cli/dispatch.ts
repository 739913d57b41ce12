import { CliInputError } from './errors.js';

export interface Output {
  out(text: string): void;
  err(text: string): void;
}

/** One `plumbline` command: its usage line and what it does with its arguments. */
export interface Command {
  usage: string;
  /** A command that works on the database answers asynchronously. */
  run(args: string[]): object | Promise<object>;
}

/**
 * Runs one `plumbline` command from the commands given (all of them, or only the one asked
 * for). Returns the exit code: 0 with one JSON object on stdout, 2 with a one-line reason on
 * stderr for bad input (no output file written), 1 for a fault. Synchronous for the file
 * commands, a promise for a command that answers asynchronously.
 */
export function dispatch(argv: string[], io: Output, commands: Readonly<Record<string, Command>>): number | Promise<number> {
  const [command, ...args] = argv;
  if (command === undefined || command === '--help' || command === 'help') {
    io.out(`${['Usage:', ...Object.values(commands).map((c) => c.usage)].join('\n  ')}\n`);
    return command === undefined ? 2 : 0;
  }
  const handler = Object.hasOwn(commands, command) ? commands[command] : undefined;
  try {
    if (!handler) throw new CliInputError(`unknown command "${command}" (commands: ${Object.keys(commands).join(', ')})`);
    const result = handler.run(args);
    if (result instanceof Promise) {
      return result.then((value) => print(io, value), (error: unknown) => failure(io, command, error));
    }
    return print(io, result);
  } catch (error) {
    return failure(io, command, error);
  }
}

function print(io: Output, result: object): number {
  io.out(`${JSON.stringify(result, null, 2)}\n`);
  return 0;
}

function failure(io: Output, command: string, error: unknown): number {
  if (error instanceof CliInputError || isArgumentError(error)) {
    io.err(`plumbline ${command}: ${oneLine((error as Error).message)}\n`);
    return 2;
  }
  io.err(`plumbline ${command}: unexpected failure: ${oneLine(String((error as Error)?.stack ?? error))}\n`);
  return 1;
}

/** Errors node's util.parseArgs raises for unknown or malformed options. */
function isArgumentError(error: unknown): boolean {
  const code = (error as { code?: string })?.code ?? '';
  return code.startsWith('ERR_PARSE_ARGS');
}

const oneLine = (s: string): string => s.replace(/\s*\n\s*/g, ' ').trim();
