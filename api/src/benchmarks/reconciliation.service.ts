// The reconciliation of the project's benchmark polls and its own running weighted figure,
// computed on request by the engine behind `plumbline reconcile` (estimation/reconcile.ts).
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { BalanceService } from '../balance/balance.service.js';
import { KNEX } from '../database/database.constants.js';
import type { ProjectRow } from '../database/tables.js';
import { effectivePoll } from '../estimation/own-poll.js';
import { DEFAULT_SPREAD, reconcile, type BiasSpec, type ReconcileInput, type ShareSummary } from '../estimation/reconcile.js';
import { BenchmarksService } from './benchmarks.service.js';
import { cautions, OWN_GROUP, OWN_POLL, reconciliationInput, type OwnFigure } from './reconciliation-input.js';

export interface ReconciledGroup {
  name: string;
  bias: BiasSpec;
  meanFactor: number;
  lower: number;
  upper: number;
  probOverstates: number;
  probUnderstates: number;
}

export interface ReconciledPoll {
  id: string;
  source: string;
  methodGroup: string;
  successes: number;
  trials: number;
  own: boolean;
  chanceOutlierProbability: number;
}

export interface Reconciliation {
  spread: number;
  defaultSpread: number;
  /** Why there is no estimate yet, in words for the lead; null when there is one. */
  problem: string | null;
  truth: ShareSummary | null;
  groups: ReconciledGroup[];
  polls: ReconciledPoll[];
  cautions: string[];
  computedAt: string;
}

/** Recent results by input: the engine takes a few hundred milliseconds and the page asks every minute. */
const REMEMBERED = 200;

@Injectable()
export class ReconciliationService {
  private readonly recent = new Map<string, ReturnType<typeof reconcile>>();

  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly benchmarks: BenchmarksService,
    private readonly balance: BalanceService,
  ) {}

  async reconciliation(project: ProjectRow): Promise<Reconciliation> {
    const [polls, groups, spread, balance] = await Promise.all([
      this.db('benchmark_polls').where({ project_id: project.id }).orderBy([{ column: 'field_end', order: 'desc' }, { column: 'created_at', order: 'asc' }]),
      this.db('benchmark_groups').where({ project_id: project.id }),
      this.benchmarks.spread(project.id),
      this.balance.balance(project),
    ]);
    const outcome = balance.outcome;
    let own: OwnFigure | null = null;
    let ownMissing: string | null = null;
    if (outcome?.weighted !== undefined && outcome.standardError) {
      own = { ...effectivePoll(outcome.weighted, outcome.standardError), weighted: outcome.weighted, completes: balance.n };
    } else {
      ownMissing = balance.weightingProblem ?? 'its weighted share has no standard error yet.';
    }
    const input = reconciliationInput(polls, groups, spread, own);
    const base = { spread, defaultSpread: DEFAULT_SPREAD, computedAt: new Date().toISOString() };
    if (input.polls.length === 0) {
      return { ...base, problem: 'No polls yet: record another poll on the same question, or wait for the project’s own weighted share.', truth: null, groups: [], polls: [], cautions: cautions(input, spread, own, ownMissing) };
    }
    const result = this.reconcileOnce(input);
    const source = new Map(polls.map((p) => [p.id, p.source]));
    return {
      ...base,
      problem: null,
      truth: result.truth,
      groups: result.groups.map((g) => ({
        name: g.id,
        bias: input.groups.find((m) => m.id === g.id)!.bias,
        meanFactor: g.meanFactor,
        lower: g.lower,
        upper: g.upper,
        probOverstates: g.probOverstates,
        probUnderstates: g.probUnderstates,
      })),
      polls: result.polls.map((p) => {
        const poll = input.polls.find((q) => q.id === p.id)!;
        return {
          id: p.id,
          source: p.id === OWN_POLL ? OWN_GROUP : (source.get(p.id) as string),
          methodGroup: poll.group,
          successes: poll.successes,
          trials: poll.trials,
          own: p.id === OWN_POLL,
          chanceOutlierProbability: p.chanceOutlierProbability,
        };
      }),
      cautions: cautions(input, spread, own, ownMissing),
    };
  }

  /** The engine is deterministic, so the same input always gives the same result. */
  private reconcileOnce(input: ReconcileInput): ReturnType<typeof reconcile> {
    const key = JSON.stringify(input);
    const known = this.recent.get(key);
    if (known) return known;
    const result = reconcile(input);
    if (this.recent.size >= REMEMBERED) this.recent.delete(this.recent.keys().next().value as string);
    this.recent.set(key, result);
    return result;
  }
}
