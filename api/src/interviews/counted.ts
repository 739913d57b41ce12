// The one definition of a counted interview is `interviews.counted`, a generated column
// (migration 20261202004100_interview_voids.ts): a complete that is neither rejected on
// review nor voided. The count tables' trigger and every query read that column. Rows not
// yet stored (a batch being written) have no such column, so this restates the rule for
// them; api/test/count-tables.e2e-spec.ts checks that it agrees with the column on every row.
import type { InterviewRow } from '../database/tables.js';

export function counted(row: Pick<InterviewRow, 'disposition'> & Partial<Pick<InterviewRow, 'review_status' | 'voided_at'>>): boolean {
  return row.disposition === 'complete' && row.review_status !== 'rejected' && (row.voided_at ?? null) === null;
}
