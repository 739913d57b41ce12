// Counts of a project's kept-and-flagged interviews by reason, for the quota board: the
// arrival flags (read through the partial index interviews_flagged, so unflagged interviews
// cost nothing) and the quality rules' flags (quality/flagged-rows.ts). An approved interview
// stops showing its flags.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import { QUALITY_FLAG_ROWS } from '../quality/flagged-rows.js';
import { QUALITY_FLAG_CODES, QUALITY_FLAGS, type QualityFlagCode } from '../quality/quality-flags.js';
import { FLAG_CODES, FLAG_REASONS, type FlagCode } from './flags.js';

/** An interview voided after it was sent: who logged it, who voided it, when and why. */
export interface VoidedInterview {
  id: string;
  disposition: string;
  fieldDay: string;
  interviewer: string;
  voidedBy: string;
  voidedAt: string;
  reason: string;
}

/** The most recent voids listed with their reasons; the count by reason covers them all. */
export const VOIDED_LISTED = 50;

export interface FlaggedInterviews {
  /** Interviews with at least one flag (one interview may carry several). */
  total: number;
  byReason: { code: string; reason: string; count: number }[];
  /** The latest voided interviews, newest first, with who voided them and why. */
  voided: VoidedInterview[];
}

const ORDER: string[] = [...FLAG_CODES, ...QUALITY_FLAG_CODES];
const order = (code: string) => (ORDER.includes(code) ? ORDER.indexOf(code) : ORDER.length);
const reasonOf = (code: string): string =>
  FLAG_REASONS[code as FlagCode] ?? QUALITY_FLAGS[code as QualityFlagCode]?.explanation ?? code.replace(/_/g, ' ');

@Injectable()
export class FlagCountsService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async counts(projectId: string): Promise<FlaggedInterviews> {
    const { rows } = await this.db.raw<{ rows: { code: string | null; n: number }[] }>(
      `SELECT code, count(DISTINCT id)::int AS n FROM (
         SELECT i.id, f.code
           FROM interviews i CROSS JOIN LATERAL unnest(i.flags) AS f(code)
          WHERE i.project_id = :project AND cardinality(i.flags) > 0 AND i.review_status <> 'approved'
         UNION ALL ${QUALITY_FLAG_ROWS}) flagged
        GROUP BY ROLLUP (code)`, // the row with no code is the total of interviews
      { project: projectId },
    );
    const voided = await this.db('interviews as i')
      .join('users as who', 'who.id', 'i.interviewer_id')
      .join('users as by', 'by.id', 'i.voided_by')
      .where('i.project_id', projectId)
      .whereNotNull('i.voided_at')
      .orderBy([{ column: 'i.voided_at', order: 'desc' }, { column: 'i.id' }])
      .limit(VOIDED_LISTED)
      .select('i.id', 'i.disposition', 'i.field_day', 'who.name as interviewer', 'by.name as voided_by_name', 'i.voided_at', 'i.void_reason');
    return {
      voided: voided.map((v) => ({
        id: v.id,
        disposition: v.disposition,
        fieldDay: v.field_day,
        interviewer: v.interviewer,
        voidedBy: v.voided_by_name,
        voidedAt: new Date(v.voided_at).toISOString(),
        reason: v.void_reason,
      })),
      total: rows.find((r) => r.code === null)?.n ?? 0,
      byReason: rows
        .filter((r) => r.code !== null)
        .map((r) => ({ code: r.code as string, reason: reasonOf(r.code as string), count: r.n }))
        .sort((a, b) => order(a.code) - order(b.code) || a.code.localeCompare(b.code)),
    };
  }
}
