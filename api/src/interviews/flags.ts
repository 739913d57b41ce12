// Flags mark an interview the server kept but a supervisor should look at. They are set on
// arrival and stored with the interview (interviews.flags); over quota has its own column.
// Each code has one plain-words reason, shown on the quota board and named in the export.

export const FLAG_REASONS = {
  project_closed: 'Sent after the project was closed',
  outside_field_dates: 'Ended more than a day outside the field dates',
  voided: 'Voided after it was sent (no longer counted); the reason is kept with it',
  retired_category: 'Logged in a category the office removed from the targets meanwhile; kept, and weighted only if the lead merges that category into a current one',
  missing_variable: 'A complete without a category of a quota variable added to the targets meanwhile; kept, left out of that variable\'s cells and of weighting',
  retired_variable: 'Logged with a quota variable the office removed from the targets meanwhile; kept, that answer is not used for quotas or weighting',
} as const;

export type FlagCode = keyof typeof FLAG_REASONS;

export const FLAG_CODES = Object.keys(FLAG_REASONS) as FlagCode[];

/** Days of slack either side of the field dates before an interview is flagged. */
export const FIELD_DATE_TOLERANCE_DAYS = 1;

export interface FlagContext {
  status: 'setup' | 'fieldwork' | 'closed';
  fieldStart: string | null;
  fieldEnd: string | null;
}

/** YYYY-MM-DD moved by a whole number of days. */
function shiftDay(day: string, days: number): string {
  return new Date(Date.parse(`${day}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
}

/** The flags of a new interview, given the project as it stands and the interview's field day. */
export function flagsOnArrival(project: FlagContext, fieldDay: string): FlagCode[] {
  const flags: FlagCode[] = [];
  if (project.status === 'closed') flags.push('project_closed');
  const early = project.fieldStart !== null && fieldDay < shiftDay(project.fieldStart, -FIELD_DATE_TOLERANCE_DAYS);
  const late = project.fieldEnd !== null && fieldDay > shiftDay(project.fieldEnd, FIELD_DATE_TOLERANCE_DAYS);
  if (early || late) flags.push('outside_field_dates');
  return flags;
}
