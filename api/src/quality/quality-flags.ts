// The words of the server's quality flags: a short label for lists and filters and one
// sentence saying what tripped it. The review queue, the quota board and the interviewers
// page all take them from here, so a flag reads the same everywhere. Each finding also keeps
// its own reason with the figures behind it (interview_findings.reason, interviewer_tests.reason).

export const QUALITY_FLAGS = {
  too_short: {
    label: 'Too short',
    explanation: 'A complete much shorter than the project’s median complete, or than the minimum the lead set',
  },
  overlapping: {
    label: 'Overlapping',
    explanation: 'Its start–end span overlaps another interview by the same interviewer',
  },
  out_of_hours: {
    label: 'Out of hours',
    explanation: 'Started outside the hours the lead set, in the project’s time zone',
  },
  burst: {
    label: 'Burst',
    explanation: 'One of more completes by one interviewer within an hour than the lead allows',
  },
  interviewer_answers: {
    label: 'Interviewer’s answers differ',
    explanation: 'Its interviewer’s headline answers differ from the other interviewers’ in the same cells more than chance allows',
  },
  backcheck_not_confirmed: {
    label: 'Back-check not confirmed',
    explanation: 'A call-back to the respondent did not confirm the interview',
  },
} as const;

export type QualityFlagCode = keyof typeof QUALITY_FLAGS;

export const QUALITY_FLAG_CODES = Object.keys(QUALITY_FLAGS) as QualityFlagCode[];

/** The timing rules stored per interview in interview_findings.rule. */
export const TIMING_RULE_CODES = ['too_short', 'overlapping', 'out_of_hours', 'burst'] as const satisfies readonly QualityFlagCode[];
