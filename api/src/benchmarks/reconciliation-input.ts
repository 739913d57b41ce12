// From stored benchmark polls, their groups, the project's spread prior and the project's own
// weighted figure to the input of the reconciliation engine (estimation/reconcile.ts), the same
// input `plumbline reconcile --input FILE.json` reads. Plain functions: no Nest, no SQL.
import type { BenchmarkGroupRow, BenchmarkPollRow } from '../database/tables.js';
import type { BiasSpec, ReconcileInput } from '../estimation/reconcile.js';

/** The project's own method group and poll id; no lead-entered group may take this name. */
export const OWN_GROUP = 'This project (weighted)';
export const OWN_POLL = 'project';

export interface OwnFigure {
  successes: number;
  trials: number;
  /** The weighted share and raw count behind it, for the cautions. */
  weighted: number;
  completes: number;
}

export function biasSpec(kind: BenchmarkGroupRow['bias_kind'], factor: number | null, spread: number): BiasSpec {
  if (kind === 'none') return { kind: 'none' };
  if (kind === 'known') return { kind: 'known', factor: factor as number };
  return { kind: 'unknown', mean: 0.5, spread };
}

export function reconciliationInput(
  polls: readonly BenchmarkPollRow[], groups: readonly BenchmarkGroupRow[], spread: number, own: OwnFigure | null,
): ReconcileInput {
  const used = groups.filter((g) => polls.some((p) => p.method_group === g.name));
  const input: ReconcileInput = {
    groups: used.map((g) => ({ id: g.name, bias: biasSpec(g.bias_kind, g.bias_factor, spread) })),
    polls: polls.map((p) => ({ id: p.id, group: p.method_group, successes: p.yes, trials: p.sample_size })),
  };
  if (!own) return input;
  // The project's own sample is a quota sample: its bias is unknown, of the same typical size.
  return {
    groups: [...input.groups, { id: OWN_GROUP, bias: biasSpec('unknown', null, spread) }],
    polls: [...input.polls, { id: OWN_POLL, group: OWN_GROUP, successes: own.successes, trials: own.trials }],
  };
}

export function cautions(input: ReconcileInput, spread: number, own: OwnFigure | null, ownMissing: string | null): string[] {
  const list = [
    "The reconciliation is only as good as the assumption about each method group's bias: a group marked as unbiased or of known bias fixes the level of the estimate, and if that assumption is wrong, so is the estimate.",
    `A group of unknown bias is given a bias factor around 0.5 with a standard deviation of ${spread} (the spread prior); a larger spread trusts such groups less.`,
    'The chance-outlier probability of a poll is the chance, were all the other polls unbiased, of a result at least that far out; a small one says the poll disagrees with the rest, not which of them is wrong.',
  ];
  if (own) {
    list.push(`This project's weighted share enters as ${own.successes} of ${own.trials}, its effective sample size from the linearised error (n* = w(1−w)/SE²), not its ${own.completes} raw interviews, which would overstate its precision; its own bias counts as unknown.`);
  }
  if (ownMissing) list.push(`This project's own figure is left out: ${ownMissing}`);
  if (input.groups.every((g) => g.bias.kind === 'unknown')) {
    list.push('No method group is marked as unbiased or of known bias, so the level of the estimate rests on the prior that the biases centre on no bias.');
  }
  return list;
}
