// The interviewer's own progress on one project, as the device knows it: the figures the
// server gave at the last sync (GET /api/projects carries them; the sync module keeps a
// copy) plus this interviewer's contacts still waiting in the outbox. Pure, so it is the
// same online and offline and the tests call it directly.
import { isRejected } from '../../db/outbox-store';
import type { FieldProject, InterviewRecord, OutboxEntry } from '../../db/plumbline-db';
import type { LocalCell } from '../../sync/cell-status';

export interface OwnProgressView {
  /** Completes the interviewer was asked for; null without an assignment. */
  target: number | null;
  completes: number;
  todayContacts: number;
  todayCompletes: number;
  /** The assigned cells as the device knows them (synced counts plus unsent completes); empty: any cell. */
  cells: LocalCell[];
  /** Assigned cells this device has no counts for yet (never synced, or gone from the targets). */
  unknownCells: number;
}

/** The calendar day (YYYY-MM-DD) of a moment in a time zone. */
export function dayIn(timeZone: string, moment: Date | string): string {
  const format = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
  return format.format(typeof moment === 'string' ? new Date(moment) : moment);
}

export function ownProgress(project: FieldProject, cells: LocalCell[] | undefined, entries: OutboxEntry[], now = new Date()): OwnProgressView {
  const today = dayIn(project.timeZone, now);
  const mine = project.mine ?? null;
  const waiting = entries
    .filter((entry) => entry.projectId === project.id && !isRejected(entry))
    .map((entry) => entry.payload as Partial<InterviewRecord>);
  const waitingToday = waiting.filter((record) => typeof record.endedAt === 'string' && dayIn(project.timeZone, record.endedAt) === today);
  const isComplete = (record: Partial<InterviewRecord>) => record.disposition === 'complete';
  // Yesterday's figures from the server are not today's: only this device's contacts count then.
  const serverToday = mine?.fieldDay === today;
  const assigned = mine?.assignment?.cellIds ?? [];
  const byId = new Map((cells ?? []).map((cell) => [cell.id, cell]));
  const known = assigned.flatMap((id) => byId.get(id) ?? []);
  return {
    target: mine?.assignment?.target ?? null,
    completes: (mine?.completes ?? 0) + waiting.filter(isComplete).length,
    todayContacts: (serverToday ? mine.todayContacts : 0) + waitingToday.length,
    todayCompletes: (serverToday ? mine.todayCompletes : 0) + waitingToday.filter(isComplete).length,
    cells: known,
    unknownCells: assigned.length - known.length,
  };
}
