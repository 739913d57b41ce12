// The grouped counts behind the interviewers' rates, each one SQL aggregate over the project:
// contacts per interviewer, field day, outcome and eligibility; median complete durations;
// findings of the timing rules on interviews not approved; the headline-answer tests; and
// back-check outcomes. Voided and rejected contacts are left out of the contacts and outcomes.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import type { Disposition, InterviewerTestRow } from '../database/tables.js';

export interface ContactGroup {
  interviewerId: string;
  fieldDay: string;
  disposition: Disposition;
  eligibilityKnown: boolean;
  count: number;
}

export interface MedianDuration {
  interviewerId: string;
  /** Null for the interviewer's whole field period. */
  fieldDay: string | null;
  seconds: number;
}

export interface BackcheckTally {
  interviewerId: string;
  selected: number;
  confirmed: number;
  notConfirmed: number;
  notReached: number;
  pending: number;
}

@Injectable()
export class RatesRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async contacts(projectId: string): Promise<ContactGroup[]> {
    const rows: { interviewer_id: string; field_day: string; disposition: Disposition; eligibility_known: boolean; count: string }[] = await this.db('interviews')
      .where({ project_id: projectId })
      .whereNull('voided_at')
      .whereNot('review_status', 'rejected')
      .groupBy('interviewer_id', 'field_day', 'disposition', this.db.raw('coalesce(eligibility_known, false)'))
      .select('interviewer_id', this.db.raw(`to_char(field_day, 'YYYY-MM-DD') AS field_day`), 'disposition')
      .select(this.db.raw('coalesce(eligibility_known, false) AS eligibility_known'), this.db.raw('count(*) AS count'));
    return rows.map((r) => ({ interviewerId: r.interviewer_id, fieldDay: r.field_day, disposition: r.disposition, eligibilityKnown: r.eligibility_known, count: Number(r.count) }));
  }

  /** The median length of counted completes per interviewer and day, and per interviewer over all days. */
  async medianDurations(projectId: string): Promise<MedianDuration[]> {
    const { rows } = await this.db.raw<{ rows: { interviewer_id: string; field_day: string | null; seconds: number }[] }>(
      `SELECT interviewer_id, to_char(field_day, 'YYYY-MM-DD') AS field_day,
              percentile_cont(0.5) WITHIN GROUP (ORDER BY extract(epoch FROM ended_at - started_at)) AS seconds
         FROM interviews WHERE project_id = ? AND counted
        GROUP BY GROUPING SETS ((interviewer_id, field_day), (interviewer_id))`,
      [projectId],
    );
    return rows.map((r) => ({ interviewerId: r.interviewer_id, fieldDay: r.field_day, seconds: Number(r.seconds) }));
  }

  /** How many of each interviewer's interviews not approved each timing rule found. */
  async findings(projectId: string): Promise<{ interviewerId: string; rule: string; count: number }[]> {
    const rows: { interviewer_id: string; rule: string; count: string }[] = await this.db('interview_findings as f')
      .join('interviews as i', 'i.id', 'f.interview_id')
      .where('f.project_id', projectId)
      .whereNot('i.review_status', 'approved')
      .groupBy('i.interviewer_id', 'f.rule')
      .select('i.interviewer_id', 'f.rule', this.db.raw('count(*) AS count'));
    return rows.map((r) => ({ interviewerId: r.interviewer_id, rule: r.rule, count: Number(r.count) }));
  }

  tests(projectId: string): Promise<InterviewerTestRow[]> {
    return this.db('interviewer_tests').where({ project_id: projectId });
  }

  async backchecks(projectId: string): Promise<BackcheckTally[]> {
    const rows: Record<string, string>[] = await this.db('backchecks')
      .where({ project_id: projectId })
      .groupBy('interviewer_id')
      .select('interviewer_id')
      .select(
        this.db.raw('count(*) AS selected'),
        this.db.raw(`count(*) FILTER (WHERE outcome = 'confirmed') AS confirmed`),
        this.db.raw(`count(*) FILTER (WHERE outcome = 'not_confirmed') AS not_confirmed`),
        this.db.raw(`count(*) FILTER (WHERE outcome = 'not_reached') AS not_reached`),
        this.db.raw('count(*) FILTER (WHERE outcome IS NULL) AS pending'),
      );
    return rows.map((r) => ({
      interviewerId: r.interviewer_id!,
      selected: Number(r.selected),
      confirmed: Number(r.confirmed),
      notConfirmed: Number(r.not_confirmed),
      notReached: Number(r.not_reached),
      pending: Number(r.pending),
    }));
  }

  /** The project's interviewers: its team's interviewers and anyone who logged a contact on it. */
  async interviewers(projectId: string): Promise<{ id: string; name: string }[]> {
    return this.db('users')
      .whereIn('id', this.db('project_members').where({ project_id: projectId }).select('user_id'))
      .where('role', 'interviewer')
      .orWhereIn('id', this.db('interviews').where({ project_id: projectId }).distinct('interviewer_id'))
      .orderBy('name')
      .select('id', 'name');
  }
}
