// Whether an interview (alias `i`) carries a flag, as a condition on its row: flags set on
// arrival and over quota are its own columns; the rules' findings, back-checks that did not
// confirm and interviewers whose answer test is flagged are small sets PostgreSQL hashes once
// per query. So the queue can walk a project's interviews in its order and stop after a page,
// instead of gathering every flagged interview first. Approved interviews are left out by the
// caller (an approved interview shows no flags).
import type { Knex } from 'knex';
import { FINDING_RULES } from './flag-labels.js';

type Condition = (q: Knex.QueryBuilder) => void;

const findings = (db: Knex, projectId: string, rule?: string) => {
  const q = db('interview_findings').where('project_id', projectId).select('interview_id');
  return rule ? q.where('rule', rule) : q;
};
const backchecks = (db: Knex, projectId: string) => db('backchecks').where({ project_id: projectId, outcome: 'not_confirmed' }).select('interview_id');
const flaggedInterviewers = (db: Knex, projectId: string) => db('interviewer_tests').where({ project_id: projectId, flagged: true }).select('interviewer_id');

/** The condition "carries this flag", or "carries any flag" when none is given. */
export function hasFlag(db: Knex, projectId: string, flag?: string): Condition {
  if (flag === 'over_quota') return (q) => q.where('i.over_quota', true);
  // The answer test is about headline answers: it marks the interviewer's completes, not their other contacts.
  if (flag === 'interviewer_answers') return (q) => q.where('i.disposition', 'complete').whereIn('i.interviewer_id', flaggedInterviewers(db, projectId));
  if (flag === 'backcheck_not_confirmed') return (q) => q.whereIn('i.id', backchecks(db, projectId));
  if (flag && (FINDING_RULES as readonly string[]).includes(flag)) return (q) => q.whereIn('i.id', findings(db, projectId, flag));
  if (flag) return (q) => q.whereRaw('? = ANY(i.flags)', [flag]);
  return (q) =>
    q.where((any) =>
      any
        .whereRaw('cardinality(i.flags) > 0')
        .orWhere('i.over_quota', true)
        .orWhereIn('i.id', findings(db, projectId))
        .orWhereIn('i.id', backchecks(db, projectId))
        .orWhere((answers) => answers.where('i.disposition', 'complete').whereIn('i.interviewer_id', flaggedInterviewers(db, projectId))),
    );
}
