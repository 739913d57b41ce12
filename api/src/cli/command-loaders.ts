// What `plumbline` loads at start-up: only the module of the command it runs (all of them
// for help or an unknown command), so a call to `posterior` never loads the CSV reader.
import { dispatch, type Command, type Output } from './dispatch.js';

const LOADERS: Readonly<Record<string, () => Promise<Command>>> = {
  weight: async () => {
    const m = await import('./weight-command.js');
    return { usage: m.WEIGHT_USAGE, run: m.weightCommand };
  },
  posterior: async () => {
    const m = await import('./posterior-command.js');
    return { usage: m.POSTERIOR_USAGE, run: m.posteriorCommand };
  },
  reconcile: async () => {
    const m = await import('./reconcile-command.js');
    return { usage: m.RECONCILE_USAGE, run: m.reconcileCommand };
  },
  rates: async () => {
    const m = await import('./rates-command.js');
    return { usage: m.RATES_USAGE, run: m.ratesCommand };
  },
  quotas: async () => {
    const m = await import('./quotas-command.js');
    return { usage: m.QUOTAS_USAGE, run: m.quotasCommand };
  },
  'quality-check': async () => {
    const m = await import('./quality-check-command.js');
    return { usage: m.QUALITY_CHECK_USAGE, run: m.qualityCheckCommand };
  },
  org: async () => {
    const m = await import('./org-command.js');
    return { usage: m.ORG_USAGE, run: m.orgCommand };
  },
};

export const COMMAND_NAMES = Object.keys(LOADERS);

/** The command asked for, or every command when the name is missing or unknown. */
export async function loadCommands(name: string | undefined): Promise<Record<string, Command>> {
  const loader = name !== undefined && Object.hasOwn(LOADERS, name) ? LOADERS[name] : undefined;
  if (loader && name !== undefined) return { [name]: await loader() };
  const all = await Promise.all(Object.entries(LOADERS).map(async ([n, load]) => [n, await load()] as const));
  return Object.fromEntries(all);
}

/** `plumbline ARGS...` as the binary runs it: load the one command, then run it. */
export async function runLazily(argv: string[], io: Output): Promise<number> {
  return dispatch(argv, io, await loadCommands(argv[0]));
}
