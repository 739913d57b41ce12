// An interviewer's own figures on their projects, for the Today page: completes so far, today's
// contacts and completes (today in the project's time zone) and the assignment, if any. They
// travel with GET /api/projects, which the device copies to IndexedDB at every sync, so Today
// shows them offline as of the last sync (the device adds its own unsent contacts).
import type { Knex } from 'knex';

export interface OwnAssignment {
  target: number;
  /** Quota cells to work; empty: any cell. */
  cellIds: string[];
}

export interface OwnProgress {
  /** The field day "today" refers to, in the project's time zone, as the server saw it. */
  fieldDay: string;
  todayContacts: number;
  todayCompletes: number;
  /** Counted completes (approved or awaiting review) on the whole project. */
  completes: number;
  assignment: OwnAssignment | null;
}

/** By project id, for the given interviewer; read from the per-interviewer count table, not the interviews. */
export async function ownProgress(db: Knex, userId: string, projectIds: string[]): Promise<Map<string, OwnProgress>> {
  if (projectIds.length === 0) return new Map();
  const [days, assignments] = await Promise.all([
    db('projects as p')
      .leftJoin('interviewer_day_counts as c', (join) => join.on('c.project_id', 'p.id').andOnVal('c.interviewer_id', userId))
      .whereIn('p.id', projectIds)
      .groupBy('p.id', 'p.time_zone')
      .select(
        'p.id',
        db.raw(`to_char((now() AT TIME ZONE p.time_zone)::date, 'YYYY-MM-DD') AS field_day`),
        db.raw('COALESCE(SUM(c.n), 0)::int AS completes'),
        db.raw('COALESCE(SUM(c.contacts) FILTER (WHERE c.field_day = (now() AT TIME ZONE p.time_zone)::date), 0)::int AS today_contacts'),
        db.raw('COALESCE(SUM(c.n) FILTER (WHERE c.field_day = (now() AT TIME ZONE p.time_zone)::date), 0)::int AS today_completes'),
      ) as Promise<{ id: string; field_day: string; completes: number; today_contacts: number; today_completes: number }[]>,
    db('interviewer_assignments').where({ user_id: userId }).whereIn('project_id', projectIds).select('project_id', 'target', 'cell_ids'),
  ]);
  const byProject = new Map(assignments.map((a) => [a.project_id, { target: a.target, cellIds: a.cell_ids }]));
  return new Map(
    days.map((d) => [
      d.id,
      {
        fieldDay: d.field_day,
        todayContacts: d.today_contacts,
        todayCompletes: d.today_completes,
        completes: d.completes,
        assignment: byProject.get(d.id) ?? null,
      },
    ]),
  );
}
