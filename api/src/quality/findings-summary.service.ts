// What the quality rules found in a project, in brief: per flag, how many interviews (not
// approved) carry it, and each interviewer's headline-answer test.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { qualityFlagCounts } from './flagged-rows.js';
import { QUALITY_FLAG_CODES, QUALITY_FLAGS, type QualityFlagCode } from './quality-flags.js';

export interface RuleCount {
  code: QualityFlagCode;
  label: string;
  explanation: string;
  interviews: number;
}

export interface InterviewerTestView {
  interviewerId: string;
  name: string;
  completes: number;
  pValue: number | null;
  adjustedPValue: number | null;
  flagged: boolean;
  reason: string;
}

export interface FindingsSummary {
  checkedAt: string | null;
  rules: RuleCount[];
  interviewers: InterviewerTestView[];
}

@Injectable()
export class FindingsSummaryService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
  ) {}

  async summary(user: AuthUser, projectId: string): Promise<FindingsSummary> {
    const project = await this.access.find(user, projectId);
    const [counts, tests] = await Promise.all([
      qualityFlagCounts(this.db, projectId),
      this.db('interviewer_tests as t')
        .join('users as u', 'u.id', 't.interviewer_id')
        .where('t.project_id', projectId)
        .orderBy([{ column: 't.flagged', order: 'desc' }, { column: 't.adjusted_p_value', order: 'asc', nulls: 'last' }, { column: 'u.name' }])
        .select('t.interviewer_id', 'u.name', 't.completes', 't.p_value', 't.adjusted_p_value', 't.flagged', 't.reason'),
    ]);
    return {
      checkedAt: project.quality_checked_at ? new Date(project.quality_checked_at).toISOString() : null,
      rules: QUALITY_FLAG_CODES.map((code) => ({ code, ...QUALITY_FLAGS[code], interviews: counts.get(code) ?? 0 })),
      interviewers: tests.map((t) => ({
        interviewerId: t.interviewer_id, name: t.name, completes: t.completes, pValue: t.p_value,
        adjustedPValue: t.adjusted_p_value, flagged: t.flagged, reason: t.reason,
      })),
    };
  }
}
