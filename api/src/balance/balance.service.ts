// The live balance of a project: counted interviews per combination of categories and
// headline answer come from interview_counts (kept in SQL by triggers), and the
// estimation core rakes those groups to the population targets. No interview is loaded.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import type { ProjectRow } from '../database/tables.js';
import { EstimationInputError } from '../estimation/errors.js';
import type { MarginTarget } from '../estimation/raking.js';
import { summariseWeighting, type OutcomeRakingCell, type OutcomeSummary } from '../estimation/weighting-summary.js';
import type { WithheldFigure } from '../estimation/withheld.js';
import { loadActiveTargets, loadJointTable } from '../quotas/cell-allocator.js';

export interface BalanceMargin {
  variable: string;
  category: string;
  target: number;
  unweighted: number;
  weighted: number | null;
}

export interface Balance {
  projectId: string;
  headlineQuestion: string;
  /** Completed interviews used (not rejected, with a category on every current variable). */
  n: number;
  /** Completes left out because they lack a category of a variable added later. */
  excluded: number;
  converged: boolean | null;
  iterations: number | null;
  designEffect: number | null;
  effectiveSampleSize: number | null;
  weightMin: number | null;
  weightMax: number | null;
  maxMarginError: number | null;
  margins: BalanceMargin[];
  /** The headline share over those who answered yes or no; null before anyone did. */
  outcome: (Partial<OutcomeSummary> & { column: string; unweighted: number; answered: number }) | null;
  /** Why no weights could be computed yet, in words for the lead; null when they were. */
  weightingProblem: string | null;
  /** Figures not given because they cannot be trusted, each with its reason (docs/methods.md, section 4). */
  withheld: WithheldFigure[];
  computedAt: string;
}

@Injectable()
export class BalanceService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async balance(project: ProjectRow): Promise<Balance> {
    const { variables } = await loadActiveTargets(this.db, project.id);
    const groups = await this.db('interview_counts')
      .where({ project_id: project.id })
      .where('n', '>', 0)
      .select('category_ids', 'n', 'yes', 'dont_know', 'no_answer');

    const labelOf = new Map<string, { variable: string; label: string }>();
    for (const v of variables) for (const c of v.categories) labelOf.set(c.id, { variable: v.name, label: c.label });
    const cells: OutcomeRakingCell[] = [];
    let excluded = 0;
    for (const g of groups) {
      const categories: Record<string, string> = {};
      for (const id of g.category_ids) {
        const known = labelOf.get(id);
        if (known) categories[known.variable] = known.label;
      }
      if (Object.keys(categories).length < variables.length) excluded += g.n;
      else cells.push({ categories, count: g.n, successes: g.yes, answered: g.n - g.dont_know - g.no_answer, dontKnow: g.dont_know });
    }
    const targets: MarginTarget[] = variables.map((v) => ({
      variable: v.name,
      shares: v.categories.map((c) => ({ category: c.label, share: c.share })),
    }));
    const n = cells.reduce((s, c) => s + c.count, 0);
    const yes = cells.reduce((s, c) => s + c.successes, 0);
    // The headline share is over those who answered yes or no (docs/methods.md, section 2).
    const answered = cells.reduce((s, c) => s + (c.answered ?? c.count), 0);
    const unweighted = (variable: string, label: string) =>
      n === 0 ? 0 : cells.reduce((s, c) => s + (c.categories[variable] === label ? c.count : 0), 0) / n;

    const base: Balance = {
      projectId: project.id,
      headlineQuestion: project.headline_question,
      n,
      excluded,
      converged: null,
      iterations: null,
      designEffect: null,
      effectiveSampleSize: null,
      weightMin: null,
      weightMax: null,
      maxMarginError: null,
      margins: targets.flatMap((t) =>
        t.shares.map((s) => ({ variable: t.variable, category: s.category, target: s.share, unweighted: unweighted(t.variable, s.category), weighted: null })),
      ),
      outcome: answered > 0 ? { column: 'headline', unweighted: yes / answered, answered } : null,
      weightingProblem: null,
      withheld: [],
      computedAt: new Date().toISOString(),
    };
    const problem = this.weightingProblem(targets, base.margins, n);
    if (problem) return { ...base, weightingProblem: problem };
    try {
      const empty = await this.emptyInterlockedCells(project.id, cells, labelOf);
      // With joint shares, weighting rakes to the interlocked cross; that needs an interview in
      // every cell with a target, so until then it rakes to the margins and withholds the intervals.
      const joint = empty.length === 0 ? await loadJointTable(this.db, project.id, variables) : null;
      const summary = summariseWeighting(cells, joint ? [...targets, joint] : targets, {}, true, empty);
      return {
        ...base,
        converged: summary.converged,
        iterations: summary.iterations,
        designEffect: summary.designEffect,
        effectiveSampleSize: summary.effectiveSampleSize,
        weightMin: summary.weightMin,
        weightMax: summary.weightMax,
        maxMarginError: summary.maxMarginError,
        margins: summary.margins,
        outcome: summary.outcome ? { column: 'headline', ...summary.outcome } : base.outcome,
        withheld: summary.withheld,
      };
    } catch (error) {
      if (error instanceof EstimationInputError) return { ...base, weightingProblem: error.message };
      throw error;
    }
  }

  /** Labels of interlocked cells with a target that no counted interview falls in. */
  private async emptyInterlockedCells(
    projectId: string,
    cells: OutcomeRakingCell[],
    labelOf: Map<string, { variable: string; label: string }>,
  ): Promise<string[]> {
    const interlocked = await this.db('quota_cells').where({ project_id: projectId, kind: 'interlocked' }).where('target', '>', 0).select('label', 'category_ids');
    return interlocked
      .filter((cell) => {
        const wanted = cell.category_ids.map((id) => labelOf.get(id)).filter((x) => x !== undefined);
        return !cells.some((c) => c.count > 0 && wanted.every((w) => c.categories[w.variable] === w.label));
      })
      .map((cell) => cell.label);
  }

  private weightingProblem(targets: MarginTarget[], margins: BalanceMargin[], n: number): string | null {
    if (targets.length === 0) return 'The project has no quota targets yet.';
    if (n < 2) return 'Weights need at least two completed interviews.';
    const empty = margins.filter((m) => m.target > 0 && m.unweighted === 0);
    if (empty.length) {
      const list = empty.slice(0, 5).map((m) => `${m.variable}: ${m.category}`).join(', ');
      return `No completed interviews yet in ${list}${empty.length > 5 ? ` and ${empty.length - 5} more` : ''}; weights can be computed once every category has at least one.`;
    }
    return null;
  }
}
