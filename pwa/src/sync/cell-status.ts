// Cell status as this device knows it: the counts from the last sync plus this interviewer's
// own contacts still in the outbox. Pure functions, so the screens and tests share them.
import { cellStatus } from '@plumbline/cell-rules';
import type { InterviewRecord, OutboxEntry, QuotaCell } from '../db/plumbline-db';
import { isRejected } from '../db/outbox-store';

export interface LocalCell extends QuotaCell {
  /** Completes in this cell still waiting on this device. */
  unsent: number;
}

/** The waiting (not refused) completes among outbox entries, as records. */
export function waitingCompletes(entries: OutboxEntry[]): InterviewRecord[] {
  return entries
    .filter((entry) => !isRejected(entry))
    .map((entry) => entry.payload as Partial<InterviewRecord>)
    .filter((record): record is InterviewRecord => record?.disposition === 'complete' && typeof record.categories === 'object');
}

/** Whether a respondent with these category ids belongs to the cell. */
export function belongsTo(cell: Pick<QuotaCell, 'categoryIds'>, categoryIds: readonly string[]): boolean {
  return cell.categoryIds.every((id) => categoryIds.includes(id));
}

/** Synced cells with this device's unsent completes added to their counts and status. */
export function withUnsent(cells: QuotaCell[], unsent: InterviewRecord[]): LocalCell[] {
  const respondents = unsent.map((record) => Object.values(record.categories ?? {}));
  return cells.map((cell) => {
    const extra = respondents.filter((ids) => belongsTo(cell, ids)).length;
    const achieved = cell.achieved + extra;
    return {
      ...cell,
      unsent: extra,
      achieved,
      remaining: Math.max(0, cell.target - achieved),
      fillRate: cell.target > 0 ? achieved / cell.target : 1,
      status: cellStatus(cell.target, achieved, cell.closedAt !== null),
    };
  });
}

/** The cells one respondent falls in (one interlocked cell, one margin per other variable). */
export function respondentCells(cells: LocalCell[], categoryIds: readonly string[]): LocalCell[] {
  return cells.filter((cell) => belongsTo(cell, categoryIds));
}

/** Cells that would make this interview over quota. */
export function blockingCells(cells: LocalCell[]): LocalCell[] {
  return cells.filter((cell) => cell.status === 'full' || cell.status === 'closed');
}
