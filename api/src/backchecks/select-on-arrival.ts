// Back-check selection as completes arrive, called by sync inside its transaction while it holds
// the project's row lock, so two batches never both see an interviewer without a back-check.
// Selected interviews get a `backchecks` row with the share they were selected at and, if the
// interviewer gave one, the respondent reference; the reference of an interview not selected is
// never stored (data minimisation). A complete sent again is not new, so it is never selected again.
import type { Knex } from 'knex';
import type { ProjectRow } from '../database/tables.js';
import { qualitySettings } from '../quality/quality-settings.js';
import { selectArrivals, type InterviewerBackchecks } from './selection.js';

export interface ArrivedComplete {
  id: string;
  interviewerId: string;
  respondentReference?: string | undefined;
}

/** Selects among completes just stored for the project; returns the ids selected. */
export async function selectOnArrival(trx: Knex.Transaction, project: ProjectRow, completes: readonly ArrivedComplete[]): Promise<string[]> {
  const settings = qualitySettings(project.quality_settings).backChecks;
  if (!settings.enabled || completes.length === 0) return [];
  const interviewers = [...new Set(completes.map((c) => c.interviewerId))];
  const counts = await trx('backchecks')
    .where({ project_id: project.id })
    .whereIn('interviewer_id', interviewers)
    .groupBy('interviewer_id')
    .select('interviewer_id', trx.raw('count(*)::int AS selected'), trx.raw("count(*) FILTER (WHERE outcome = 'not_confirmed')::int AS not_confirmed"));
  const before = new Map<string, InterviewerBackchecks>(
    (counts as unknown as { interviewer_id: string; selected: number; not_confirmed: number }[]).map((r) => [
      r.interviewer_id,
      { selected: r.selected, notConfirmed: r.not_confirmed },
    ]),
  );
  const arrivals = completes.map((c) => ({ interviewId: c.id, interviewerId: c.interviewerId }));
  const chosen = selectArrivals(project.quality_seed, settings, arrivals, before);
  if (chosen.length === 0) return [];
  const references = new Map(completes.map((c) => [c.id, c.respondentReference ?? null]));
  await trx('backchecks')
    .insert(
      chosen.map((s) => ({
        interview_id: s.interviewId,
        project_id: project.id,
        interviewer_id: s.interviewerId,
        share_at_selection: s.shareAtSelection,
        respondent_reference: references.get(s.interviewId) ?? null,
      })),
    )
    .onConflict('interview_id')
    .ignore();
  return chosen.map((s) => s.interviewId);
}
