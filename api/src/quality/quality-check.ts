// One run of the quality rules over a whole project: read what the rules need, run them, and
// replace the project's findings and interviewer tests in one transaction. A plain function
// over Knex, so the job worker, the command line, the demo seed and the benchmark share it.
import type { Knex } from 'knex';
import type { ProjectRow } from '../database/tables.js';
import { FIELD_DATE_TOLERANCE_DAYS } from '../interviews/flags.js';
import { timingFindings, type TimedInterview } from './interview-rules.js';
import { interviewerAnswerTests, type AnsweredComplete, type InterviewerAnswerTest } from './interviewer-answers.js';
import { qualitySettings } from './quality-settings.js';

export interface QualityCheckResult {
  projectId: string;
  interviews: number;
  /** Interview findings stored (one interview may trip several rules). */
  findings: number;
  interviewersTested: number;
  interviewersFlagged: number;
  checkedAt: string;
}

/** Timing rules look at every interview still standing (a voided one was never really done). */
async function timedInterviews(trx: Knex.Transaction, projectId: string): Promise<TimedInterview[]> {
  const { rows } = await trx.raw<{ rows: { id: string; i: string; d: string; s: number; e: number }[] }>(
    `SELECT id, interviewer_id AS i, disposition AS d,
            (extract(epoch FROM started_at) * 1000)::float8 AS s, (extract(epoch FROM ended_at) * 1000)::float8 AS e
       FROM interviews WHERE project_id = ? AND voided_at IS NULL`,
    [projectId],
  );
  return rows.map((r) => ({ id: r.id, interviewerId: r.i, disposition: r.d, startedAt: new Date(r.s), endedAt: new Date(r.e) }));
}

/** Counted completes that answered the headline yes or no, by interviewer and category combination (interviewer_counts). */
async function answeredCompletes(trx: Knex.Transaction, projectId: string): Promise<AnsweredComplete[]> {
  const rows = await trx('interviewer_counts')
    .where({ project_id: projectId })
    .select('interviewer_id', 'category_ids', 'yes', trx.raw('(n - yes - dont_know - no_answer)::int AS no'));
  const out: AnsweredComplete[] = [];
  for (const row of rows as unknown as { interviewer_id: string; category_ids: string[]; yes: number; no: number }[]) {
    const stratum = [...row.category_ids].sort().join(',');
    for (let k = 0; k < row.yes; k++) out.push({ interviewerId: row.interviewer_id, stratum, yes: true });
    for (let k = 0; k < row.no; k++) out.push({ interviewerId: row.interviewer_id, stratum, yes: false });
  }
  return out;
}

function testFigures(t: InterviewerAnswerTest): Record<string, number> {
  const figures: Record<string, number> = {};
  for (const key of ['statistic', 'observedYes', 'expectedYes', 'strataUsed'] as const) {
    const value = t[key];
    if (value !== null) figures[key] = value;
  }
  return figures;
}

/**
 * The field dates may move after interviews arrived: the arrival flag 'outside_field_dates'
 * (interviews.flags) follows the dates as they are now, with the same day of slack as on arrival.
 * Only rows whose flag changes are written, so a run with unchanged dates writes nothing.
 */
async function refreshFieldDateFlags(trx: Knex.Transaction, projectId: string): Promise<void> {
  await trx.raw(
    `UPDATE interviews i
        SET flags = CASE WHEN o.outside THEN array_append(i.flags, 'outside_field_dates') ELSE array_remove(i.flags, 'outside_field_dates') END
       FROM (SELECT j.id, coalesce(j.field_day < p.field_start - ?::int, false) OR coalesce(j.field_day > p.field_end + ?::int, false) AS outside
               FROM interviews j JOIN projects p ON p.id = j.project_id WHERE j.project_id = ?) o
      WHERE i.id = o.id AND ('outside_field_dates' = ANY (i.flags)) IS DISTINCT FROM o.outside`,
    [FIELD_DATE_TOLERANCE_DAYS, FIELD_DATE_TOLERANCE_DAYS, projectId],
  );
}

/** Runs every rule the project's settings switch on and stores what they found. */
export async function runQualityCheck(db: Knex, projectId: string): Promise<QualityCheckResult> {
  return db.transaction(async (trx) => {
    // One run per project at a time (the job, the command line and the seed may overlap);
    // each run reads the settings and interviews as they are once it holds the lock.
    await trx.raw('SELECT pg_advisory_xact_lock(hashtext(?))', [`quality:${projectId}`]);
    const project = (await trx('projects').where({ id: projectId }).first('id', 'quality_settings', 'time_zone')) as Pick<ProjectRow, 'id' | 'quality_settings' | 'time_zone'> | undefined;
    if (!project) throw new Error(`no project ${projectId}`);
    const settings = qualitySettings(project.quality_settings);
    const [interviews, answered] = await Promise.all([timedInterviews(trx, projectId), settings.interviewerAnswers.enabled ? answeredCompletes(trx, projectId) : []]);
    const findings = timingFindings(interviews, settings, project.time_zone);
    const tests = settings.interviewerAnswers.enabled ? interviewerAnswerTests(answered, settings.interviewerAnswers) : [];

    const ids: string[] = [];
    const rules: string[] = [];
    const reasons: string[] = [];
    const figures: string[] = [];
    for (const [id, list] of findings) {
      // One row per interview and rule: an interview overlapping several others keeps the largest overlap.
      const byRule = new Map<string, (typeof list)[number]>();
      for (const f of list) {
        const kept = byRule.get(f.rule);
        if (!kept || Number(f.figures.overlapMinutes ?? 0) > Number(kept.figures.overlapMinutes ?? 0)) byRule.set(f.rule, f);
      }
      for (const f of byRule.values()) {
        ids.push(id);
        rules.push(f.rule);
        reasons.push(f.reason);
        figures.push(JSON.stringify(f.figures));
      }
    }

    // Only now the project's row: held for the writes alone, so syncs wait as little as possible.
    const [{ now }] = (await trx.raw<{ rows: { now: Date }[] }>('SELECT now() AS now FROM projects WHERE id = ? FOR NO KEY UPDATE', [projectId])).rows as [{ now: Date }];
    await refreshFieldDateFlags(trx, projectId);
    await trx('interview_findings').where({ project_id: projectId }).delete();
    await trx('interviewer_tests').where({ project_id: projectId }).delete();
    if (ids.length) {
      await trx.raw(
        `INSERT INTO interview_findings (interview_id, project_id, rule, reason, figures)
         SELECT t.i, ?, t.r, t.why, t.f FROM unnest(?::uuid[], ?::text[], ?::text[], ?::jsonb[]) AS t(i, r, why, f)`,
        [projectId, ids, rules, reasons, figures],
      );
    }
    if (tests.length) {
      await trx('interviewer_tests').insert(
        tests.map((t) => ({
          project_id: projectId, interviewer_id: t.interviewerId, completes: t.completes, p_value: t.pValue,
          adjusted_p_value: t.adjustedPValue, flagged: t.flagged, reason: t.reason, figures: testFigures(t),
        })),
      );
    }
    await trx('projects').where({ id: projectId }).update({ quality_checked_at: now });
    return {
      projectId, interviews: interviews.length, findings: ids.length,
      interviewersTested: tests.filter((t) => t.pValue !== null).length, interviewersFlagged: tests.filter((t) => t.flagged).length,
      checkedAt: now.toISOString(),
    };
  });
}
