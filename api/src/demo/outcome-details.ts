// The demo's contacts, told apart as the interviewers' rates need: about a third of the
// non-contacts and 'other' outcomes where the interviewer knew someone eligible lived there, and
// about a third of the not-eligible contacts turned away instead because their cell was full
// (with the categories of the interviewer's next complete that day, as the cell check would have
// recorded them). Invented, like the rest of the demo; the completes are untouched.
import type { Knex } from 'knex';

export async function addOutcomeDetails(db: Knex, projectId: string): Promise<void> {
  await db.raw(
    `UPDATE interviews SET eligibility_known = true
      WHERE project_id = ? AND disposition IN ('non_contact', 'other') AND get_byte(decode(md5(id::text), 'hex'), 0) < 85`,
    [projectId],
  );
  await db.raw(
    `UPDATE interviews i SET disposition = 'quota_full', category_ids = coalesce(
        (SELECT c.category_ids FROM interviews c
          WHERE c.project_id = i.project_id AND c.interviewer_id = i.interviewer_id AND c.field_day = i.field_day
            AND c.disposition = 'complete' AND c.started_at > i.started_at
          ORDER BY c.started_at LIMIT 1), i.category_ids)
      WHERE i.project_id = ? AND i.disposition = 'not_eligible' AND get_byte(decode(md5(i.id::text), 'hex'), 0) < 85`,
    [projectId],
  );
}
