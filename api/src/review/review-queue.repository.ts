// One page of the review queue: flagged interviews first, then the rest (approved ones count
// as the rest), each group newest first. The page is keyed by where the last one ended
// (group, started_at, id), so every page reads about a page of rows through the index
// interviews_review_order (migration 20261202006200), however many interviews the project has.
import type { Knex } from 'knex';
import type { ReviewStatus } from '../database/tables.js';
import { hasFlag } from './flag-predicates.js';
import { detailColumns, type RowDetails } from './queue-row-details.js';

export interface QueueFilters {
  flag?: string;
  interviewerId?: string;
  fieldDay?: string;
  /** Categories of the chosen cell: interviews in all of them. */
  cellCategoryIds?: string[];
  status?: ReviewStatus;
}

/** Where the previous page ended: group (0 flagged, 1 the rest), started_at as PostgreSQL wrote it, id. */
export interface QueueCursor {
  group: 0 | 1;
  startedAt: string;
  id: string;
}

export interface QueueRow extends RowDetails {
  id: string;
  interviewer_id: string;
  interviewer_name: string;
  field_day: string;
  started_at: Date;
  ended_at: Date;
  started_key: string;
  disposition: string;
  headline_answer: string | null;
  review_status: ReviewStatus;
  flags: string[];
  over_quota: boolean;
  group: 0 | 1;
}

function filtered(db: Knex, projectId: string, f: QueueFilters) {
  const q = db('interviews as i').join('users as u', 'u.id', 'i.interviewer_id').where('i.project_id', projectId);
  if (f.interviewerId) q.where('i.interviewer_id', f.interviewerId);
  if (f.fieldDay) q.where('i.field_day', f.fieldDay);
  if (f.cellCategoryIds) q.whereRaw('i.category_ids @> ?::uuid[]', [f.cellCategoryIds]);
  if (f.status) q.where('i.review_status', f.status);
  return q;
}

function page(db: Knex, q: Knex.QueryBuilder, group: 0 | 1, after: QueueCursor | undefined, limit: number) {
  if (after && after.group === group) q.whereRaw('(i.started_at, i.id) < (?::timestamptz, ?::uuid)', [after.startedAt, after.id]);
  return q
    .orderBy([{ column: 'i.started_at', order: 'desc' }, { column: 'i.id', order: 'desc' }])
    .limit(limit)
    .select(
      'i.id', 'i.interviewer_id', 'u.name as interviewer_name', 'i.field_day', 'i.started_at', 'i.ended_at', 'i.disposition',
      'i.headline_answer', 'i.review_status', 'i.flags', 'i.over_quota',
      db.raw('i.started_at::text AS started_key'), db.raw('?::int AS "group"', [group]), ...detailColumns(db),
    ) as Promise<QueueRow[]>;
}

/** Up to `limit` rows after the cursor, and whether more follow. */
export async function queuePage(db: Knex, projectId: string, f: QueueFilters, after: QueueCursor | undefined, limit: number) {
  const rows: QueueRow[] = [];
  if (f.status !== 'approved' && (!after || after.group === 0)) {
    const flagged = filtered(db, projectId, f).whereNot('i.review_status', 'approved').where(hasFlag(db, projectId, f.flag));
    rows.push(...(await page(db, flagged, 0, after, limit + 1)));
  }
  // Filtering by a flag lists only the interviews that carry it.
  if (!f.flag && rows.length <= limit) {
    const rest = filtered(db, projectId, f).where((w) => w.where('i.review_status', 'approved').orWhereNot(hasFlag(db, projectId)));
    rows.push(...(await page(db, rest, 1, after, limit + 1 - rows.length)));
  }
  return { rows: rows.slice(0, limit), more: rows.length > limit };
}
