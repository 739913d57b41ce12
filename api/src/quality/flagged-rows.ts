// The quality flags as rows (interview id, code) for one project, for counting: the timing
// rules' findings, every counted complete of an interviewer whose answers test flagged, and
// back-checks that did not confirm. An approved interview stops showing its flags.
import type { Knex } from 'knex';

/** SQL of the rows; bind the project id as `:project`. */
export const QUALITY_FLAG_ROWS = `
  SELECT f.interview_id AS id, f.rule AS code
    FROM interview_findings f JOIN interviews i ON i.id = f.interview_id
   WHERE f.project_id = :project AND i.review_status <> 'approved'
  UNION ALL
  SELECT i.id, 'interviewer_answers'
    FROM interviewer_tests t JOIN interviews i ON i.project_id = t.project_id AND i.interviewer_id = t.interviewer_id
   WHERE t.project_id = :project AND t.flagged AND i.counted AND i.review_status <> 'approved'
  UNION ALL
  SELECT b.interview_id, 'backcheck_not_confirmed'
    FROM backchecks b JOIN interviews i ON i.id = b.interview_id
   WHERE b.project_id = :project AND b.outcome = 'not_confirmed' AND i.review_status <> 'approved'`;

/** Interviews (not approved) per quality flag code. */
export async function qualityFlagCounts(db: Knex, projectId: string): Promise<Map<string, number>> {
  const { rows } = await db.raw<{ rows: { code: string; n: number }[] }>(
    `SELECT code, count(DISTINCT id)::int AS n FROM (${QUALITY_FLAG_ROWS}) q GROUP BY code`,
    { project: projectId },
  );
  return new Map(rows.map((r) => [r.code, r.n]));
}
