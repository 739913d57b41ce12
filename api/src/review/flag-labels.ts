// Every flag the review queue shows or filters on: its code, a short label and what it means.
// Arrival flags take their words from interviews/flags.ts; the others come from the quality
// checks (quality/quality-flags.ts: interview_findings rules, the interviewer's answer test,
// back-checks) and over quota.
// Each flag on an interview also carries its own reason and figures (review-flags.ts).
import { FLAG_CODES, FLAG_REASONS, type FlagCode } from '../interviews/flags.js';
import { QUALITY_FLAGS, TIMING_RULE_CODES } from '../quality/quality-flags.js';

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
export const FINDING_RULES = TIMING_RULE_CODES;

const OVER_QUOTA: FlagLabel = { label: 'Over quota', explanation: 'Arrived when a cell it belongs to was already full or closed' };

export const FLAG_LABELS: Record<string, FlagLabel> = {
  ...Object.fromEntries(FLAG_CODES.map((code) => [code, { label: ARRIVAL_LABELS[code], explanation: FLAG_REASONS[code] }])),
  over_quota: OVER_QUOTA,
  ...QUALITY_FLAGS,
};

/** Every code the queue can filter on, in the order screens list them. */
export const REVIEW_FLAG_CODES = Object.keys(FLAG_LABELS);

/** Label and explanation of a code; a code no longer set reads as its words. */
export function flagLabel(code: string): FlagLabel {
  return FLAG_LABELS[code] ?? { label: code.replace(/_/g, ' '), explanation: code.replace(/_/g, ' ') };
}
