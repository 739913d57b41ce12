// Which of a project's interviews carry a flag, as a subquery of interview ids: flags set on
// arrival, over quota, the rules' findings, an interviewer whose answer test is flagged, and
// back-checks that did not confirm. Each source reads an index of its own, so the set costs
// what the flagged interviews cost, not the whole project. Approved interviews are left out
// by the caller (an approved interview shows no flags).
import type { Knex } from 'knex';
import { FINDING_RULES } from './flag-labels.js';

type Source = (db: Knex, projectId: string) => Knex.QueryBuilder;

const arrival = (db: Knex, projectId: string, code: string) =>
  db('interviews').where('project_id', projectId).whereRaw('cardinality(flags) > 0').whereRaw('? = ANY(flags)', [code]).select('id');

const overQuota: Source = (db, projectId) => db('interviews').where({ project_id: projectId, over_quota: true }).select('id');

const anyArrival: Source = (db, projectId) =>
  db('interviews').where('project_id', projectId).whereRaw('(cardinality(flags) > 0 OR over_quota)').select('id');

const findings = (db: Knex, projectId: string, rule?: string) => {
  const q = db('interview_findings').where('project_id', projectId).select('interview_id as id');
  return rule ? q.where('rule', rule) : q;
};

const interviewerAnswers: Source = (db, projectId) =>
  db('interviews as i')
    .join('interviewer_tests as t', (j) => j.on('t.project_id', 'i.project_id').andOn('t.interviewer_id', 'i.interviewer_id'))
    .where({ 'i.project_id': projectId, 't.flagged': true })
    .select('i.id');

const backchecks: Source = (db, projectId) => db('backchecks').where({ project_id: projectId, outcome: 'not_confirmed' }).select('interview_id as id');

/** Ids of the project's interviews with the given flag, or with any flag when none is given. */
export function flaggedIds(db: Knex, projectId: string, flag?: string): Knex.QueryBuilder {
  if (flag === 'over_quota') return overQuota(db, projectId);
  if (flag === 'interviewer_answers') return interviewerAnswers(db, projectId);
  if (flag === 'backcheck_not_confirmed') return backchecks(db, projectId);
  if (flag && (FINDING_RULES as readonly string[]).includes(flag)) return findings(db, projectId, flag);
  if (flag) return arrival(db, projectId, flag);
  return anyArrival(db, projectId)
    .union(findings(db, projectId))
    .union(interviewerAnswers(db, projectId))
    .union(backchecks(db, projectId));
}
