// The live balance of a project: counted interviews per combination of categories and
// headline answer come from interview_counts (kept in SQL by triggers), and the
// estimation core rakes those groups to the population targets. No interview is loaded.
import { BadRequestException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import type { ProjectRow } from '../database/tables.js';
import { EstimationInputError } from '../estimation/errors.js';
import type { MarginTarget } from '../estimation/raking.js';
import { summariseWeighting, type OutcomeRakingCell, type OutcomeSummary } from '../estimation/weighting-summary.js';
import type { WithheldFigure } from '../estimation/withheld.js';
import { loadActiveTargets, loadJointTable } from '../quotas/cell-allocator.js';
import { loadCategoryMap } from '../quotas/category-map.js';
import { interviewerEffect, type InterviewerCellCount, type InterviewerEffect } from './interviewer-effect.js';

export interface BalanceMargin {
  variable: string;
  category: string;
  target: number;
  unweighted: number;
  weighted: number | null;
}

/** A category the office retired that holds interviews, and what weighting does with them. */
export interface RetiredCategory {
  id: string;
  variable: string;
  category: string;
  /** Counted interviews logged in it. */
  interviews: number;
  /** The current category of the same variable its interviews count as; null when they are not weighted. */
  mergedInto: string | null;
  /** That category's label; null when not merged. */
  mergedIntoLabel: string | null;
  /** The current categories of the same variable it may be merged into. */
  choices: { id: string; label: string }[];
}

export interface Balance {
  projectId: string;
  headlineQuestion: string;
  /** Completed interviews used (not rejected, with a category on every current variable). */
  n: number;
  /** Completes left out because they lack a category of a variable added later. */
  excluded: number;
  /** Completes left out because they were logged in a retired category not merged into a current one. */
  notWeighted: number;
  /** Retired categories of current variables that hold interviews. */
  retired: RetiredCategory[];
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
  /** The interviewers' effect on the headline answer; null with fewer than two interviewers with answers. */
  interviewerEffect: InterviewerEffect | null;
  computedAt: string;
}

function invalid(message: string, field: string): BadRequestException {
  return new BadRequestException({ message, fields: [{ field, message }] });
}

@Injectable()
export class BalanceService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  /** Merges a retired category's interviews into a current category of the same variable for weighting, or (null) undoes it. */
  async mergeRetired(projectId: string, categoryId: string, mergedInto: string | null): Promise<void> {
    const category = await this.db('quota_categories').where({ project_id: projectId, id: categoryId }).first();
    if (!category) throw new NotFoundException('No such category in this project');
    if (!category.retired) throw invalid('this category is current; only a retired category can be merged into another', 'categoryId');
    if (mergedInto !== null) {
      const into = await this.db('quota_categories').where({ project_id: projectId, id: mergedInto }).first();
      if (!into || into.retired || into.variable_id !== category.variable_id) {
        throw invalid('mergedInto must be a current category of the same variable', 'mergedInto');
      }
    }
    await this.db('quota_categories').where({ id: categoryId }).update({ merged_into: mergedInto });
  }

  async balance(project: ProjectRow): Promise<Balance> {
    const { variables } = await loadActiveTargets(this.db, project.id);
    const groups = await this.db('interview_counts')
      .where({ project_id: project.id })
      .where('n', '>', 0)
      .select('category_ids', 'n', 'yes', 'dont_know', 'no_answer');

    const labelOf = new Map<string, { variable: string; label: string }>();
    for (const v of variables) for (const c of v.categories) labelOf.set(c.id, { variable: v.name, label: c.label });
    // Interviews are read through what each category counts as today (category-map.ts).
    const meaning = await loadCategoryMap(this.db, project.id);
    const activeVariables = new Set(variables.map((v) => v.id));
    const inRetired = new Map<string, number>();
    const cells: OutcomeRakingCell[] = [];
    let excluded = 0;
    let notWeighted = 0;
    // The categories a combination is weighted as, and whether a retired one of them is not weighted.
    const weightedAs = (ids: string[]) => {
      const categories: Record<string, string> = {};
      let unmerged = false;
      for (const id of ids) {
        const m = meaning.get(id);
        if (!m || !activeVariables.has(m.variableId)) continue;
        const known = m.countsAs ? labelOf.get(m.countsAs) : undefined;
        if (known) categories[known.variable] = known.label;
        else unmerged = true;
      }
      return { categories, unmerged, weighted: !unmerged && Object.keys(categories).length === variables.length };
    };
    for (const g of groups) {
      for (const id of g.category_ids) {
        const m = meaning.get(id);
        if (m?.retired && activeVariables.has(m.variableId)) inRetired.set(id, (inRetired.get(id) ?? 0) + g.n);
      }
      const { categories, unmerged } = weightedAs(g.category_ids);
      if (unmerged) notWeighted += g.n;
      else if (Object.keys(categories).length < variables.length) excluded += g.n;
      else cells.push({ categories, count: g.n, successes: g.yes, answered: g.n - g.dont_know - g.no_answer, dontKnow: g.dont_know });
    }
    const perInterviewer = await this.interviewerCells(project.id, weightedAs);
    const retired = [...inRetired].map(([id, interviews]) => {
      const m = meaning.get(id)!;
      const choices = (variables.find((v) => v.id === m.variableId)?.categories ?? []).map((c) => ({ id: c.id, label: c.label }));
      return { id, variable: m.variable, category: m.label, interviews, mergedInto: m.countsAs, mergedIntoLabel: m.countsAs ? (labelOf.get(m.countsAs)?.label ?? null) : null, choices };
    });
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
      notWeighted,
      retired,
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
      interviewerEffect: interviewerEffect(perInterviewer, null, n),
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
        interviewerEffect: interviewerEffect(perInterviewer, summary.designEffect, n),
      };
    } catch (error) {
      if (error instanceof EstimationInputError) return { ...base, weightingProblem: error.message };
      throw error;
    }
  }

  /** Each interviewer's weighted completes that answered yes or no, per weighting cell (from interviewer_counts). */
  private async interviewerCells(
    projectId: string,
    weightedAs: (ids: string[]) => { categories: Record<string, string>; weighted: boolean },
  ): Promise<InterviewerCellCount[]> {
    const rows = await this.db('interviewer_counts').where({ project_id: projectId }).where('n', '>', 0).select('interviewer_id', 'category_ids', 'n', 'yes', 'dont_know', 'no_answer');
    return rows.flatMap((r) => {
      const { categories, weighted } = weightedAs(r.category_ids);
      const cell = JSON.stringify(Object.entries(categories).sort(([a], [b]) => a.localeCompare(b)));
      return weighted ? [{ interviewer: r.interviewer_id, cell, yes: r.yes, answered: r.n - r.dont_know - r.no_answer }] : [];
    });
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
