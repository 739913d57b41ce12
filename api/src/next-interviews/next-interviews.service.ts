// Where the next interviews help most: the weighting cells come from interview_counts (kept by
// triggers) read through what each category counts as today, as the balance reads them; the
// quota cells and their counts come from the quota board's query. Nothing is stored.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import { EstimationInputError } from '../estimation/errors.js';
import { JOINT_SEPARATOR } from '../estimation/joint-names.js';
import { nextInterviews, type CellGain, type EffortQuotaCell, type PlannedCell } from '../estimation/next-interviews.js';
import type { MarginTarget, RakingCell } from '../estimation/raking.js';
import { loadActiveTargets, loadJointTable } from '../quotas/cell-allocator.js';
import { loadCategoryMap } from '../quotas/category-map.js';
import { CellsService } from '../quotas/cells.service.js';

export interface NextInterviewsView {
  projectId: string;
  count: number;
  n: number;
  effectiveSampleSize: number | null;
  designEffect: number | null;
  plan: PlannedCell[];
  planned: number;
  effectiveSampleSizeAfter: number | null;
  ranking: CellGain[];
  costly: CellGain[];
  problem: string | null;
  computedAt: string;
}

@Injectable()
export class NextInterviewsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly cells: CellsService,
  ) {}

  async nextInterviews(projectId: string, count: number): Promise<NextInterviewsView> {
    const { variables } = await loadActiveTargets(this.db, projectId);
    const labelOf = new Map(variables.flatMap((v) => v.categories.map((c) => [c.id, { variable: v.name, label: c.label }] as const)));
    const meaning = await loadCategoryMap(this.db, projectId);
    const groups = await this.db('interview_counts').where({ project_id: projectId }).where('n', '>', 0).select('category_ids', 'n');
    const weighting: RakingCell[] = [];
    for (const g of groups) {
      const categories: Record<string, string> = {};
      for (const id of g.category_ids) {
        const m = meaning.get(id);
        const known = m?.countsAs ? labelOf.get(m.countsAs) : undefined;
        if (known) categories[known.variable] = known.label;
      }
      // As in the balance: an interview lacking a category of a current variable is not weighted.
      if (Object.keys(categories).length === variables.length) weighting.push({ categories, count: g.n });
    }
    const quotaCells: EffortQuotaCell[] = (await this.cells.cellCounts(projectId)).map((c) => ({
      id: c.id,
      label: c.label,
      categories: Object.fromEntries(c.categoryIds.flatMap((id) => {
        const known = labelOf.get(id);
        return known ? [[known.variable, known.label]] : [];
      })),
      target: c.target,
      achieved: c.achieved,
      closed: c.closedAt !== null,
    }));
    const targets: MarginTarget[] = variables.map((v) => ({ variable: v.name, shares: v.categories.map((c) => ({ category: c.label, share: c.share })) }));
    const n = weighting.reduce((s, c) => s + c.count, 0);
    const empty = {
      projectId, count, n, effectiveSampleSize: null, designEffect: null, plan: [], planned: 0,
      effectiveSampleSizeAfter: null, ranking: [], costly: [], computedAt: new Date().toISOString(),
    };
    const problem = this.problem(targets, weighting, n);
    if (problem) return { ...empty, problem };
    const joint = await loadJointTable(this.db, projectId, variables);
    try {
      const result = nextInterviews(weighting, joint && this.covers(joint, weighting) ? [...targets, joint] : targets, quotaCells, count);
      return { ...empty, ...result, problem: null };
    } catch (error) {
      if (error instanceof EstimationInputError) return { ...empty, problem: error.message };
      throw error;
    }
  }

  /** Why no weights exist yet: the next interviews then belong in the empty categories. */
  private problem(targets: MarginTarget[], cells: RakingCell[], n: number): string | null {
    if (targets.length === 0) return 'The project has no quota targets yet.';
    if (n < 2) return 'Weights need at least two completed interviews.';
    const empty = targets.flatMap((t) => t.shares
      .filter((s) => s.share > 0 && !cells.some((c) => c.categories[t.variable] === s.category))
      .map((s) => `${t.variable}: ${s.category}`));
    if (empty.length === 0) return null;
    const list = empty.slice(0, 5).join(', ') + (empty.length > 5 ? ` and ${empty.length - 5} more` : '');
    return `No completed interviews yet in ${list}. Get one in each first: weights, and so this plan, need at least one in every category.`;
  }

  /** As the balance: the joint table is raked to once every one of its cells with a share holds an interview. */
  private covers(joint: MarginTarget, cells: RakingCell[]): boolean {
    const parts = joint.parts ?? [];
    const seen = new Set(cells.map((c) => parts.map((p) => c.categories[p]).join('\u0000')));
    return joint.shares.every((s) => s.share === 0 || seen.has(s.category.split(JOINT_SEPARATOR).join('\u0000')));
  }
}
