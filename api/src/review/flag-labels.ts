// Every flag the review queue shows or filters on: its code, a short label and what it means.
// Arrival flags take their words from interviews/flags.ts; the others come from the quality
// checks (interview_findings rules, the interviewer's answer test, back-checks) and over quota.
// Each flag on an interview also carries its own reason and figures (review-flags.ts).
import { FLAG_CODES, FLAG_REASONS, type FlagCode } from '../interviews/flags.js';
import type { TimingRule } from '../quality/interview-rules.js';

export interface FlagLabel {
  label: string;
  explanation: string;
}

const ARRIVAL_LABELS: Record<FlagCode, string> = {
  project_closed: 'After the project closed',
  outside_field_dates: 'Outside the field dates',
  voided: 'Voided',
  retired_category: 'Removed category',
  missing_variable: 'Missing a quota variable',
  retired_variable: 'Removed quota variable',
};

/** Rules the server runs over a project's interviews (interview_findings.rule). */
export const FINDING_RULES = ['too_short', 'overlapping', 'out_of_hours', 'burst'] as const satisfies readonly TimingRule[];

const QUALITY_LABELS: Record<TimingRule | 'over_quota' | 'interviewer_answers' | 'backcheck_not_confirmed', FlagLabel> = {
  over_quota: { label: 'Over quota', explanation: 'Arrived when a cell it belongs to was already full or closed' },
  too_short: { label: 'Too short', explanation: 'Shorter than the project\'s limit for a complete' },
  overlapping: { label: 'Overlapping', explanation: 'Its start-to-end span overlaps another interview by the same interviewer' },
  out_of_hours: { label: 'Out of hours', explanation: 'Started outside the hours the lead set' },
  burst: { label: 'Burst', explanation: 'One of more completes by one interviewer within an hour than the lead allows' },
  interviewer_answers: {
    label: 'Interviewer\'s answers differ',
    explanation: 'This interviewer\'s headline answers differ from the rest of the sample more than chance allows, with the cell mix held fixed',
  },
  backcheck_not_confirmed: { label: 'Back-check not confirmed', explanation: 'A call-back to the respondent did not confirm the interview' },
};

export const FLAG_LABELS: Record<string, FlagLabel> = {
  ...Object.fromEntries(FLAG_CODES.map((code) => [code, { label: ARRIVAL_LABELS[code], explanation: FLAG_REASONS[code] }])),
  ...QUALITY_LABELS,
};

/** Every code the queue can filter on, in the order screens list them. */
export const REVIEW_FLAG_CODES = Object.keys(FLAG_LABELS);

/** Label and explanation of a code; a code no longer set reads as its words. */
export function flagLabel(code: string): FlagLabel {
  return FLAG_LABELS[code] ?? { label: code.replace(/_/g, ' '), explanation: code.replace(/_/g, ' ') };
}
