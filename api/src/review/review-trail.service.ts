// The audit trail of review decisions, read only: one interview's steps, and the whole
// project's trail as CSV. Nothing here (nor any route) changes a decision once recorded.
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import { stringify } from 'csv-stringify';
import type { Knex } from 'knex';
import type { Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { KNEX } from '../database/database.constants.js';
import type { ReviewDecisionRow, ReviewStatus } from '../database/tables.js';

export interface TrailEntry {
  id: string;
  interviewId: string;
  action: ReviewDecisionRow['action'];
  previousStatus: ReviewStatus;
  newStatus: ReviewStatus;
  reason: string;
  decidedBy: { id: string; name: string };
  decidedAt: string;
}

type TrailRow = ReviewDecisionRow & { decided_by_name: string };

const trail = (db: Knex, projectId: string) =>
  db('review_decisions as d')
    .join('users as u', 'u.id', 'd.decided_by')
    .where('d.project_id', projectId)
    .orderBy([{ column: 'd.decided_at' }, { column: 'd.id' }]);

@Injectable()
export class ReviewTrailService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async ofInterview(projectId: string, interviewId: string): Promise<TrailEntry[]> {
    const interview = await this.db('interviews').where({ id: interviewId.toLowerCase(), project_id: projectId }).first('id');
    if (!interview) throw new NotFoundException('No such interview in this project');
    const rows = (await trail(this.db, projectId).where('d.interview_id', interview.id).select('d.*', 'u.name as decided_by_name')) as TrailRow[];
    return rows.map((r) => ({
      id: String(r.id),
      interviewId: r.interview_id,
      action: r.action,
      previousStatus: r.previous_status,
      newStatus: r.new_status,
      reason: r.reason,
      decidedBy: { id: r.decided_by, name: r.decided_by_name },
      decidedAt: new Date(r.decided_at).toISOString(),
    }));
  }

  /** Every decision of the project, oldest first, one row each. */
  async writeCsv(projectId: string, out: Writable): Promise<void> {
    const rows = trail(this.db, projectId)
      .join('interviews as i', 'i.id', 'd.interview_id')
      .join('users as who', 'who.id', 'i.interviewer_id')
      .select('d.decided_at', 'd.interview_id', 'who.name as interviewer', 'i.field_day', 'd.action', 'd.previous_status', 'd.new_status', 'd.reason', 'u.name as decided_by_name')
      .stream();
    const csv = stringify({
      header: true,
      columns: ['decided_at', 'interview_id', 'interviewer', 'field_day', 'action', 'previous_status', 'new_status', 'reason', 'decided_by'],
      // Reasons and names are typed by people: a cell starting with = + - @ tab or carriage return
      // is prefixed with a quote so a spreadsheet does not run it (OWASP, CSV injection).
      escape_formulas: true,
    });
    const toRecord = async function* (source: AsyncIterable<{ decided_at: Date; interview_id: string; interviewer: string; field_day: string; action: string; previous_status: string; new_status: string; reason: string; decided_by_name: string }>) {
      for await (const r of source) {
        yield [new Date(r.decided_at).toISOString(), r.interview_id, r.interviewer, r.field_day, r.action, r.previous_status, r.new_status, r.reason, r.decided_by_name];
      }
    };
    await pipeline(rows, toRecord, csv, out);
  }
}
