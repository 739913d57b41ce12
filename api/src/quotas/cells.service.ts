// Cell counts come from interview_counts (counted interviews per combination of
// categories, kept by triggers) matched to cells, so the cost follows the number of cells.
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import { cellStatus, type CellStatus } from '@plumbline/cell-rules';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import { loadVariableViews, type VariableView } from './cell-allocator.js';

export interface CellView {
  id: string;
  kind: 'interlocked' | 'margin';
  label: string;
  categoryIds: string[];
  target: number;
  achieved: number;
  overQuota: number;
  remaining: number;
  fillRate: number;
  status: CellStatus;
  closedAt: string | null;
}

export interface CellsView {
  variables: VariableView[];
  cells: CellView[];
  refreshedAt: string;
}

export interface InterviewerProgress {
  id: string;
  name: string;
  completesToday: number;
  completesTotal: number;
  contactsTotal: number;
  overQuota: number;
}

/**
 * SQL condition for interviews that count toward a cell: completes not rejected on review.
 * The triggers behind interview_counts (migration 20261202000400) apply the same rule.
 */
export const counted = (alias = 'interviews') =>
  `${alias}.disposition = 'complete' AND ${alias}.review_status <> 'rejected'`;

@Injectable()
export class CellsService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async cellCounts(projectId: string, db: Knex = this.db): Promise<CellView[]> {
    const { rows } = await db.raw<{
      rows: { id: string; kind: CellView['kind']; label: string; category_ids: string[]; target: number; closed_at: Date | null; achieved: number; over_quota: number }[];
    }>(
      `WITH g AS (SELECT category_ids, n, over_quota FROM interview_counts WHERE project_id = ? AND n > 0)
       SELECT c.id, c.kind, c.label, c.category_ids, c.target, c.closed_at,
              coalesce(sum(g.n), 0)::int AS achieved, coalesce(sum(g.over_quota), 0)::int AS over_quota
         FROM quota_cells c LEFT JOIN g ON g.category_ids @> c.category_ids
        WHERE c.project_id = ?
        GROUP BY c.id ORDER BY c.position`,
      [projectId, projectId],
    );
    return rows.map((r) => ({
      id: r.id,
      kind: r.kind,
      label: r.label,
      categoryIds: r.category_ids,
      target: r.target,
      achieved: r.achieved,
      overQuota: r.over_quota,
      remaining: Math.max(0, r.target - r.achieved),
      fillRate: r.target > 0 ? r.achieved / r.target : 1,
      status: cellStatus(r.target, r.achieved, r.closed_at !== null),
      closedAt: r.closed_at?.toISOString() ?? null,
    }));
  }

  async cells(projectId: string): Promise<CellsView> {
    return {
      variables: await loadVariableViews(this.db, projectId),
      cells: await this.cellCounts(projectId),
      refreshedAt: new Date().toISOString(),
    };
  }

  /** Completes per interviewer; "today" is today in the project's time zone. */
  async interviewerProgress(projectId: string, timeZone: string): Promise<InterviewerProgress[]> {
    const { rows } = await this.db.raw<{ rows: InterviewerProgress[] }>(
      `SELECT u.id, u.name,
              count(i.id) FILTER (WHERE ${counted('i')} AND i.field_day = (now() AT TIME ZONE ?)::date)::int AS "completesToday",
              count(i.id) FILTER (WHERE ${counted('i')})::int AS "completesTotal",
              count(i.id)::int AS "contactsTotal",
              count(i.id) FILTER (WHERE i.over_quota)::int AS "overQuota"
         FROM users u
         LEFT JOIN interviews i ON i.interviewer_id = u.id AND i.project_id = ?
        WHERE u.id IN (SELECT user_id FROM project_members WHERE project_id = ?) AND u.role = 'interviewer'
           OR u.id IN (SELECT interviewer_id FROM interviews WHERE project_id = ?)
        GROUP BY u.id ORDER BY u.name`,
      [timeZone, projectId, projectId, projectId],
    );
    return rows;
  }

  async setClosed(user: AuthUser, projectId: string, cellId: string, closed: boolean): Promise<CellView> {
    const updated = await this.db('quota_cells')
      .where({ id: cellId, project_id: projectId })
      .update(closed ? { closed_at: this.db.fn.now(), closed_by: user.id } : { closed_at: null, closed_by: null });
    if (!updated) throw new NotFoundException('No such cell');
    const cell = (await this.cellCounts(projectId)).find((c) => c.id === cellId);
    return cell as CellView;
  }
}
