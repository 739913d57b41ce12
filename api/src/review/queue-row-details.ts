// What the queue shows of each interview beyond its own columns, read in the page's one query:
// its categories' names, the rules' findings, a back-check that did not confirm, its
// interviewer's flagged answer test and the cells that made it over quota. PostgreSQL works
// these out only for the rows of the page (after the limit), so a page costs one round trip.
import type { Knex } from 'knex';

export interface RowDetails {
  categories: { variable: string; label: string }[];
  findings: { rule: string; reason: string; figures: Record<string, number | string> }[];
  backcheck_note: string | null;
  interviewer_test: { reason: string; figures: Record<string, number | string>; p_value: number | null; adjusted_p_value: number | null } | null;
  over_quota_labels: string[];
}

const DETAILS = {
  categories: `(SELECT coalesce(json_agg(json_build_object('variable', v.name, 'label', c.label) ORDER BY v.position), '[]')
      FROM quota_categories c JOIN quota_variables v ON v.id = c.variable_id WHERE c.id = ANY(i.category_ids))`,
  findings: `(SELECT coalesce(json_agg(json_build_object('rule', f.rule, 'reason', f.reason, 'figures', f.figures) ORDER BY f.rule), '[]')
      FROM interview_findings f WHERE f.interview_id = i.id)`,
  backcheck_note: `(SELECT coalesce(b.outcome_note, '') FROM backchecks b WHERE b.interview_id = i.id AND b.outcome = 'not_confirmed')`,
  interviewer_test: `(SELECT json_build_object('reason', t.reason, 'figures', t.figures, 'p_value', t.p_value, 'adjusted_p_value', t.adjusted_p_value)
      FROM interviewer_tests t WHERE i.disposition = 'complete' AND t.project_id = i.project_id AND t.interviewer_id = i.interviewer_id AND t.flagged)`,
  over_quota_labels: `(SELECT coalesce(json_agg(q.label ORDER BY q.position), '[]') FROM quota_cells q WHERE q.id = ANY(i.over_quota_cells))`,
} satisfies Record<keyof RowDetails, string>;

/** The select-list expressions, each named as its field. */
export function detailColumns(db: Knex): Knex.Raw[] {
  return Object.entries(DETAILS).map(([name, sql]) => db.raw(`${sql} AS ${name}`));
}
