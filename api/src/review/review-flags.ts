// The flags of one page of the queue, each with its label, its reason in words and the figures
// behind it: arrival flags and over quota from the interview itself, the rules' findings,
// the interviewer's answer test and back-checks that did not confirm. Approved interviews
// show none.
import type { Knex } from 'knex';
import { flagLabel } from './flag-labels.js';
import type { QueueRow } from './review-queue.repository.js';

export interface Figure {
  name: string;
  value: number | string;
}

export interface ReviewFlag {
  code: string;
  label: string;
  reason: string;
  figures: Figure[];
}

const figuresOf = (figures: Record<string, number | string> | null | undefined): Figure[] =>
  Object.entries(figures ?? {}).map(([name, value]) => ({ name, value }));

function flag(code: string, reason?: string, figures: Figure[] = []): ReviewFlag {
  const { label, explanation } = flagLabel(code);
  return { code, label, reason: reason ?? explanation, figures };
}

/** Flags of each row, by interview id. */
export async function flagsOfRows(db: Knex, projectId: string, rows: QueueRow[]): Promise<Map<string, ReviewFlag[]>> {
  const open = rows.filter((r) => r.review_status !== 'approved');
  const ids = open.map((r) => r.id);
  const interviewers = [...new Set(open.map((r) => r.interviewer_id))];
  const cellIds = [...new Set(open.flatMap((r) => (r.over_quota ? r.over_quota_cells : [])))];
  const none = Promise.resolve([]);
  const [findings, tests, backchecks, cells] = await Promise.all([
    ids.length ? db('interview_findings').whereIn('interview_id', ids).orderBy('rule').select('interview_id', 'rule', 'reason', 'figures') : none,
    ids.length ? db('interviewer_tests').where({ project_id: projectId, flagged: true }).whereIn('interviewer_id', interviewers)
      .select('interviewer_id', 'reason', 'figures', 'p_value', 'adjusted_p_value') : none,
    ids.length ? db('backchecks').whereIn('interview_id', ids).where('outcome', 'not_confirmed').select('interview_id', 'outcome_note') : none,
    cellIds.length ? db('quota_cells').whereIn('id', cellIds).select('id', 'label') : none,
  ]);
  const cellLabel = new Map(cells.map((c) => [c.id, c.label]));
  const testOf = new Map(tests.map((t) => [t.interviewer_id, t]));
  const result = new Map<string, ReviewFlag[]>(rows.map((r) => [r.id, []]));
  for (const r of open) {
    const list = result.get(r.id)!;
    for (const code of r.flags) list.push(flag(code));
    if (r.over_quota) {
      const names = r.over_quota_cells.map((id) => cellLabel.get(id) ?? 'a cell since removed');
      list.push(flag('over_quota', names.length ? `Arrived when ${names.join(', ')} ${names.length === 1 ? 'was' : 'were'} full or closed` : undefined,
        [{ name: 'cells', value: names.length }]));
    }
    const test = testOf.get(r.interviewer_id);
    if (test) {
      const pValues: Figure[] = [{ name: 'pValue', value: test.p_value ?? 'none' }, { name: 'adjustedPValue', value: test.adjusted_p_value ?? 'none' }];
      list.push(flag('interviewer_answers', test.reason, [...pValues, ...figuresOf(test.figures).filter((f) => !/^(pValue|adjustedPValue)$/.test(f.name))]));
    }
  }
  for (const f of findings) result.get(f.interview_id)?.push(flag(f.rule, f.reason, figuresOf(f.figures)));
  for (const b of backchecks) result.get(b.interview_id)?.push(flag('backcheck_not_confirmed', `Back-check did not confirm it: ${b.outcome_note ?? ''}`.trim()));
  return result;
}
