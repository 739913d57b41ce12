// The projection to the end of fieldwork: per-day counts come from interview_day_counts (kept
// by triggers), grouped once per combination of categories and matched to the quota cells, so
// the cost follows combinations × days, never interviews. The figures are the pure functions
// of estimation/projection.ts (docs/methods.md, "Projection to the end of fieldwork").
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import type { ProjectRow } from '../database/tables.js';
import { projectCells, projectTotal, type CellProjection, type CountInterval } from '../estimation/projection.js';

/** The pace is over at most this many full field days before today. */
export const PACE_WINDOW_DAYS = 7;
export const PROJECTION_LEVEL = 0.9;

export interface ProjectedCell extends CellProjection {
  label: string;
  target: number;
  achieved: number;
  closed: boolean;
}

export interface Projection {
  projectId: string;
  level: number;
  /** Today in the project's time zone. */
  asOf: string;
  windowFrom: string | null;
  windowTo: string | null;
  windowDays: number;
  fieldEnd: string | null;
  /** Field days from today to the field end, both counted; 0 after it; null without a field end. */
  daysLeft: number | null;
  target: number;
  completes: number;
  completesToday: number;
  pacePerDay: number | null;
  atEnd: CountInterval | null;
  probabilityBelowTarget: number | null;
  targetReached: boolean;
  targetDate: { expected: string; earliest: string; latest: string } | null;
  cells: ProjectedCell[];
  /** Why there is no projection yet, in words for the lead; null when there is one. */
  problem: string | null;
  computedAt: string;
}

interface Days {
  today: string;
  window_from: string;
  window_to: string;
  window_days: number;
  days_after_today: number | null;
}

interface CellRow {
  id: string;
  label: string;
  target: number;
  closed: boolean;
  achieved: number;
  window: number;
}

function addDays(date: string, days: number): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

@Injectable()
export class ProjectionService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async projection(project: ProjectRow): Promise<Projection> {
    // The window ends before today (today is not over) or after the field end, whichever is first.
    const { rows: [days] } = await this.db.raw<{ rows: Days[] }>(
      `WITH t AS (SELECT (now() AT TIME ZONE ?)::date AS today, ?::date AS field_start, ?::date AS field_end),
            e AS (SELECT today, field_start, field_end, least(today, coalesce(field_end + 1, today)) AS window_end FROM t),
            w AS (SELECT *, greatest(window_end - ${PACE_WINDOW_DAYS}, coalesce(field_start, window_end - ${PACE_WINDOW_DAYS})) AS window_start FROM e)
       SELECT to_char(today, 'YYYY-MM-DD') AS today, to_char(window_start, 'YYYY-MM-DD') AS window_from,
              to_char(window_end - 1, 'YYYY-MM-DD') AS window_to, greatest(0, window_end - window_start)::int AS window_days,
              CASE WHEN field_end IS NULL THEN NULL ELSE greatest(-1, field_end - today)::int END AS days_after_today
         FROM w`,
      [project.time_zone, project.field_start, project.field_end],
    );
    const { rows: groups } = await this.db.raw<{ rows: { total: number; window: number; today: number }[] }>(
      `SELECT coalesce(sum(n), 0)::int AS total,
              coalesce(sum(n) FILTER (WHERE field_day BETWEEN ?::date AND ?::date), 0)::int AS window,
              coalesce(sum(n) FILTER (WHERE field_day = ?::date), 0)::int AS today
         FROM interview_day_counts WHERE project_id = ?`,
      [days!.window_from, days!.window_to, days!.today, project.id],
    );
    const totals = groups[0]!;
    const { rows: cellRows } = await this.db.raw<{ rows: CellRow[] }>(
      `WITH g AS (SELECT category_ids, sum(n) AS n, sum(n) FILTER (WHERE field_day BETWEEN ?::date AND ?::date) AS window
                    FROM interview_day_counts WHERE project_id = ? AND n > 0 GROUP BY category_ids)
       SELECT c.id, c.label, c.target, c.closed_at IS NOT NULL AS closed,
              coalesce(sum(g.n), 0)::int AS achieved, coalesce(sum(g.window), 0)::int AS window
         FROM quota_cells c LEFT JOIN g ON g.category_ids @> c.category_ids
        WHERE c.project_id = ? GROUP BY c.id ORDER BY c.position`,
      [days!.window_from, days!.window_to, project.id, project.id],
    );
    return this.figures(project, days!, totals, cellRows);
  }

  private figures(project: ProjectRow, days: Days, totals: { total: number; window: number; today: number }, cellRows: CellRow[]): Projection {
    const base = {
      projectId: project.id,
      level: PROJECTION_LEVEL,
      asOf: days.today,
      windowDays: days.window_days,
      windowFrom: days.window_days > 0 ? days.window_from : null,
      windowTo: days.window_days > 0 ? days.window_to : null,
      fieldEnd: project.field_end,
      daysLeft: days.days_after_today === null ? null : days.days_after_today + 1,
      target: project.target_size,
      completes: totals.total,
      completesToday: totals.today,
      targetReached: totals.total >= project.target_size,
      computedAt: new Date().toISOString(),
    };
    if (days.window_days <= 0) {
      return {
        ...base, pacePerDay: null, atEnd: null, probabilityBelowTarget: null, targetDate: null, cells: [],
        problem: 'No full field day yet: the projection starts the day after the first field day.',
      };
    }
    const pace = totals.window / days.window_days;
    // What is left of today: a whole day less the part today's completes have already used.
    let remainingDays: number | null = null;
    if (days.days_after_today !== null) {
      const todayPart = days.days_after_today < 0 ? 0 : pace > 0 ? Math.max(0, 1 - totals.today / pace) : 1;
      remainingDays = Math.max(0, days.days_after_today) + todayPart;
    }
    const total = projectTotal({
      completes: totals.total, windowCompletes: totals.window, windowDays: days.window_days, remainingDays, target: project.target_size, level: PROJECTION_LEVEL,
    });
    const cellInputs = cellRows.map((c) => ({ id: c.id, target: c.target, achieved: c.achieved, windowCompletes: c.window, closed: c.closed }));
    const projected = projectCells(cellInputs, days.window_days, remainingDays ?? 0, PROJECTION_LEVEL);
    const dt = total.daysToTarget;
    return {
      ...base,
      pacePerDay: total.pacePerDay,
      atEnd: total.atEnd,
      probabilityBelowTarget: total.probabilityBelowTarget,
      targetDate: dt && { expected: addDays(days.today, dt.expected), earliest: addDays(days.today, dt.earliest), latest: addDays(days.today, dt.latest) },
      cells: projected.map((p, i) => ({ ...p, label: cellRows[i]!.label, target: cellRows[i]!.target, achieved: cellRows[i]!.achieved, closed: cellRows[i]!.closed })),
      problem: remainingDays === null ? 'No field end date is set: only the date the target is reached is projected; set the field end for the cells.' : null,
    };
  }
}
