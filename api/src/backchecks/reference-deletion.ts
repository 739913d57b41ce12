// Respondent references are pseudonymous personal data (GDPR Recital 26): each is deleted a set
// number of days (the project's keepReferenceDays, default 30) after its back-check's outcome was
// recorded, and for a back-check never done, that many days after it was selected once the
// project is closed and its field period ended that long ago. The row keeps when it was deleted,
// so the work list can say "deleted on <date>". `now` is a parameter so tests need not wait.
import type { Knex } from 'knex';
import { DEFAULT_QUALITY_SETTINGS } from '../quality/quality-settings.js';

export const REFERENCE_DELETION_QUEUE = { name: 'backcheck-reference-deletion', retryLimit: 3, retryDelaySeconds: 60 };
/** Every hour, on the hour (cron, UTC). */
export const REFERENCE_DELETION_CRON = '0 * * * *';

/** Deletes every reference kept past its time; returns how many were deleted. */
export async function deleteExpiredReferences(db: Knex, now: Date = new Date()): Promise<number> {
  const keep = `coalesce((p.quality_settings -> 'backChecks' ->> 'keepReferenceDays')::numeric, ?) * interval '1 day'`;
  const result = await db.raw(
    `UPDATE backchecks b SET respondent_reference = NULL, reference_deleted_at = ?
       FROM projects p
      WHERE p.id = b.project_id AND b.respondent_reference IS NOT NULL
        AND (b.recorded_at < ?::timestamptz - ${keep}
             OR (b.recorded_at IS NULL AND p.status = 'closed'
                 AND b.selected_at < ?::timestamptz - ${keep}
                 AND (p.field_end IS NULL OR p.field_end < ?::timestamptz - ${keep})))`,
    [now, now, DEFAULT_QUALITY_SETTINGS.backChecks.keepReferenceDays, now, DEFAULT_QUALITY_SETTINGS.backChecks.keepReferenceDays, now, DEFAULT_QUALITY_SETTINGS.backChecks.keepReferenceDays],
  );
  return (result as { rowCount: number }).rowCount;
}
