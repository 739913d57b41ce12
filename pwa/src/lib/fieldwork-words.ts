// Plain words for fieldwork values, shared by the interviewer's screens.
import type { CellStatus, Disposition, HeadlineAnswer } from '../db/plumbline-db';

export const dispositionWords: Record<Disposition, string> = {
  complete: 'Complete',
  partial: 'Partial',
  refusal: 'Refusal',
  non_contact: 'Non-contact',
  other: 'Other',
  not_eligible: 'Not eligible',
  quota_full: 'Turned away: cell full',
};

/** One line under each outcome on the log-contact screen. */
export const dispositionHints: Record<Disposition, string> = {
  complete: 'The whole interview was done',
  partial: 'Started, not finished',
  refusal: 'Would not take part',
  non_contact: 'Nobody reached',
  other: 'Anything else',
  not_eligible: 'Not in the survey’s population',
  quota_full: 'Their cell was full, so no interview',
};

/** The outcomes offered first; 'quota_full' is logged from the cell check, once the respondent's cells are known. */
export const dispositionOrder: Disposition[] = ['complete', 'partial', 'refusal', 'non_contact', 'other', 'not_eligible'];

export const cellStatusWords: Record<CellStatus, string> = {
  open: 'Open',
  nearly_full: 'Nearly full',
  full: 'Full',
  closed: 'Closed',
};

export function dispositionWord(value: unknown): string {
  return typeof value === 'string' && value in dispositionWords ? dispositionWords[value as Disposition] : 'Unknown outcome';
}

/** The headline question's answers in the order they are offered. */
export const headlineAnswerOrder: HeadlineAnswer[] = ['yes', 'no', 'dont_know', 'no_answer'];

export const headlineAnswerWords: Record<HeadlineAnswer, string> = {
  yes: 'Yes',
  no: 'No',
  dont_know: 'Don’t know',
  no_answer: 'No answer',
};

/** An answer as stored on the device, older apps' true and false read as yes and no. */
export function headlineAnswerOf(value: unknown): HeadlineAnswer | undefined {
  if (value === true) return 'yes';
  if (value === false) return 'no';
  return typeof value === 'string' && value in headlineAnswerWords ? (value as HeadlineAnswer) : undefined;
}
