// The quality rules as the lead edits them: numbers as typed (shares in percent), checked
// here with the server's rules so most mistakes are said before anything is sent.
import type { QualitySettings } from '../api/quality-settings';

export interface QualityDraft {
  tooShort: boolean;
  fractionPercent: string;
  minimumMinutes: string;
  overlapping: boolean;
  outOfHours: boolean;
  from: string;
  to: string;
  bursts: boolean;
  perHour: string;
  answers: boolean;
  minimumCompletes: string;
  falseDiscoveryRate: string;
  backChecks: boolean;
  sharePercent: string;
  raisePercent: string;
  keepReferenceDays: string;
}

export type QualityProblems = Partial<Record<keyof QualityDraft, string>>;

const percent = (share: number) => String(Number((share * 100).toFixed(1)));

export function toDraft(s: QualitySettings): QualityDraft {
  return {
    tooShort: s.tooShort.enabled, fractionPercent: percent(s.tooShort.fractionOfMedian), minimumMinutes: s.tooShort.minimumMinutes === null ? '' : String(s.tooShort.minimumMinutes),
    overlapping: s.overlapping.enabled,
    outOfHours: s.outOfHours.enabled, from: s.outOfHours.from, to: s.outOfHours.to,
    bursts: s.bursts.enabled, perHour: String(s.bursts.perHour),
    answers: s.interviewerAnswers.enabled, minimumCompletes: String(s.interviewerAnswers.minimumCompletes), falseDiscoveryRate: String(s.interviewerAnswers.falseDiscoveryRate),
    backChecks: s.backChecks.enabled, sharePercent: percent(s.backChecks.share), raisePercent: percent(s.backChecks.raiseAfterNotConfirmed), keepReferenceDays: String(s.backChecks.keepReferenceDays),
  };
}

const CLOCK = /^([01]\d|2[0-3]):[0-5]\d$/;

/** The settings the draft stands for, or what is wrong with it. Untouched shares keep their exact value (a third stays a third). */
export function checkQualityDraft(draft: QualityDraft, saved: QualitySettings): { settings?: QualitySettings; problems: QualityProblems } {
  const problems: QualityProblems = {};
  const before = toDraft(saved);
  const number = (field: keyof QualityDraft, ok: (x: number) => boolean, message: string): number => {
    const text = String(draft[field]).trim();
    const x = text === '' ? Number.NaN : Number(text.replace(',', '.'));
    if (!Number.isFinite(x) || !ok(x)) problems[field] = message;
    return x;
  };
  const share = (field: 'fractionPercent' | 'sharePercent' | 'raisePercent', exact: number, ok: (x: number) => boolean, message: string) => {
    const x = number(field, ok, message);
    return draft[field].trim() === before[field] ? exact : x / 100;
  };
  const whole = (x: number) => Number.isInteger(x);
  const fraction = share('fractionPercent', saved.tooShort.fractionOfMedian, (x) => x > 0 && x <= 100, 'A share of the median, more than 0% and at most 100%');
  const minutesText = draft.minimumMinutes.trim();
  const minimumMinutes = minutesText === '' ? null : number('minimumMinutes', (x) => x > 0 && x <= 600, 'Leave empty, or minutes more than 0 and at most 600');
  for (const field of ['from', 'to'] as const) if (!CLOCK.test(draft[field].trim())) problems[field] = 'A time of day written HH:MM, such as 08:00';
  if (!problems.from && !problems.to && draft.from.trim() === draft.to.trim()) problems.to = 'Must differ from the start, or no hours are left';
  const perHour = number('perHour', (x) => whole(x) && x >= 1 && x <= 100, 'A whole number from 1 to 100');
  const minimumCompletes = number('minimumCompletes', (x) => whole(x) && x >= 2 && x <= 100000, 'A whole number, at least 2');
  const falseDiscoveryRate = number('falseDiscoveryRate', (x) => x > 0 && x < 1, 'More than 0 and less than 1, such as 0.10');
  const shareOf = share('sharePercent', saved.backChecks.share, (x) => x > 0 && x <= 100, 'More than 0% and at most 100%');
  const raise = share('raisePercent', saved.backChecks.raiseAfterNotConfirmed, (x) => x >= 0 && x <= 100, 'From 0% to 100%');
  const keepReferenceDays = number('keepReferenceDays', (x) => whole(x) && x >= 1 && x <= 365, 'A whole number of days from 1 to 365');
  if (Object.keys(problems).length > 0) return { problems };
  return {
    problems,
    settings: {
      tooShort: { enabled: draft.tooShort, fractionOfMedian: fraction, minimumMinutes },
      overlapping: { enabled: draft.overlapping },
      outOfHours: { enabled: draft.outOfHours, from: draft.from.trim(), to: draft.to.trim() },
      bursts: { enabled: draft.bursts, perHour },
      interviewerAnswers: { enabled: draft.answers, minimumCompletes, falseDiscoveryRate },
      backChecks: { enabled: draft.backChecks, share: shareOf, raiseAfterNotConfirmed: raise, keepReferenceDays },
    },
  };
}
