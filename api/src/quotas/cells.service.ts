// Cell counts come from interview_counts (counted interviews per combination of
// categories, kept by triggers) matched to cells, so the cost follows the number of cells.
// Per-interviewer progress comes from interviewer_day_counts, so its cost follows
// interviewers × field days. A counted interview is `interviews.counted` (migration
// 20261202000700), the one definition the triggers use.
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import { cellStatus, type CellStatus } from '@plumbline/cell-rules';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import { loadVariableViews, type VariableView } from './cell-allocator.js';
import { Coalescer } from './coalesce.js';

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

export interface BoardCounts {
  cells: CellView[];
  interviewers: InterviewerProgress[];
}

export interface InterviewerProgress {
  id: string;
  name: string;
  completesToday: number;
  completesTotal: number;
  contactsTotal: number;
  overQuota: number;
}

/** A cell with its counts and what follows from them (remaining, fill, status). */
export function withCounts(cell: Pick<CellView, 'id' | 'kind' | 'label' | 'categoryIds' | 'target' | 'closedAt'>, achieved: number, overQuota: number): CellView {
  return {
    ...cell,
    achieved,
    overQuota,
    remaining: Math.max(0, cell.target - achieved),
    fillRate: cell.target > 0 ? achieved / cell.target : 1,
    status: cellStatus(cell.target, achieved, cell.closedAt !== null),
  };
}

@Injectable()
export class CellsService {
  private readonly boards = new Coalescer<BoardCounts>();

  constructor(@Inject(KNEX) private readonly db: Knex) {}

  /** The quota board's figures; supervisors polling one project at once share each read. */
  board(projectId: string, timeZone: string): Promise<BoardCounts> {
    return this.boards.run(`${projectId} ${timeZone}`, async () => {
      const [cells, interviewers] = await Promise.all([this.cellCounts(projectId), this.interviewerProgress(projectId, timeZone)]);
      return { cells, interviewers };
    });
  }

  async cellCounts(projectId: string, db: Knex = this.db): Promise<CellView[]> {
    const { rows } = await db.raw<{
      rows: { id: string; kind: CellView['kind']; label: string; category_ids: string[]; target: number; closed_at: Date | null; achieved: number; over_quota: number }[];
    }>(
      // An over-quota interview counts on the cell that made it so (over_quota_cells), read
      // through a partial index: over-quota interviews are few.
      `WITH g AS (SELECT category_ids, n FROM interview_counts WHERE project_id = ? AND n > 0),
            o AS (SELECT cell_id, count(*) AS n FROM interviews, unnest(over_quota_cells) AS cell_id
                   WHERE project_id = ? AND over_quota AND counted GROUP BY cell_id)
       SELECT c.id, c.kind, c.label, c.category_ids, c.target, c.closed_at,
              coalesce(sum(g.n), 0)::int AS achieved, coalesce(max(o.n), 0)::int AS over_quota
         FROM quota_cells c LEFT JOIN g ON g.category_ids @> c.category_ids LEFT JOIN o ON o.cell_id = c.id
        WHERE c.project_id = ?
        GROUP BY c.id ORDER BY c.position`,
      [projectId, projectId, projectId],
    );
    return rows.map((r) =>
      withCounts(
        { id: r.id, kind: r.kind, label: r.label, categoryIds: r.category_ids, target: r.target, closedAt: r.closed_at?.toISOString() ?? null },
        r.achieved,
        r.over_quota,
      ),
    );
  }

  async cells(projectId: string): Promise<CellsView> {
    return {
      variables: await loadVariableViews(this.db, projectId),
      cells: await this.cellCounts(projectId),
      refreshedAt: new Date().toISOString(),
    };
  }

  /**
   * Completes per interviewer; "today" is today in the project's time zone. Lists the
   * project's interviewers and anyone else who has logged contacts for it.
   */
  async interviewerProgress(projectId: string, timeZone: string): Promise<InterviewerProgress[]> {
    const { rows } = await this.db.raw<{ rows: InterviewerProgress[] }>(
      `WITH c AS (
         SELECT interviewer_id,
                sum(n) FILTER (WHERE field_day = (now() AT TIME ZONE ?)::date) AS today,
                sum(n) AS total, sum(contacts) AS contacts, sum(over_quota) AS over_quota
           FROM interviewer_day_counts WHERE project_id = ? GROUP BY interviewer_id)
       SELECT u.id, u.name, coalesce(c.today, 0)::int AS "completesToday", coalesce(c.total, 0)::int AS "completesTotal",
              coalesce(c.contacts, 0)::int AS "contactsTotal", coalesce(c.over_quota, 0)::int AS "overQuota"
         FROM users u
         LEFT JOIN c ON c.interviewer_id = u.id
        WHERE u.id IN (SELECT user_id FROM project_members WHERE project_id = ? UNION ALL SELECT interviewer_id FROM c)
          AND (u.role = 'interviewer' OR c.interviewer_id IS NOT NULL)
        ORDER BY u.name`,
      [timeZone, projectId, projectId],
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
