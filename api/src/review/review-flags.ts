// The flags of an interview in the queue, each with its label, its reason in words and the
// figures behind it: arrival flags and over quota from the interview itself, then the rules'
// findings, the interviewer's answer test and a back-check that did not confirm (read with
// the page: queue-row-details.ts). Approved interviews show none.
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

export function flagsOfRow(r: QueueRow): ReviewFlag[] {
  if (r.review_status === 'approved') return [];
  const list = r.flags.map((code) => flag(code));
  if (r.over_quota) {
    const names = r.over_quota_labels;
    const reason = names.length ? `Arrived when ${names.join(', ')} ${names.length === 1 ? 'was' : 'were'} full or closed` : undefined;
    list.push(flag('over_quota', reason, [{ name: 'cells', value: names.length }]));
  }
  list.push(...r.findings.map((f) => flag(f.rule, f.reason, figuresOf(f.figures))));
  const test = r.interviewer_test;
  if (test) {
    const pValues: Figure[] = [{ name: 'pValue', value: test.p_value ?? 'none' }, { name: 'adjustedPValue', value: test.adjusted_p_value ?? 'none' }];
    list.push(flag('interviewer_answers', test.reason, [...pValues, ...figuresOf(test.figures).filter((f) => !/^(pValue|adjustedPValue)$/.test(f.name))]));
  }
  if (r.backcheck_note !== null) list.push(flag('backcheck_not_confirmed', `Back-check did not confirm it: ${r.backcheck_note}`.trim()));
  return list;
}
