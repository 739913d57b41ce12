// Which arriving completes are back-checked: decided once per interview when it arrives, from a
// hash of (project seed, interview id), so the list never reshuffles as more data comes in and
// the same seed and data give the same sample. Plain functions: no Nest, no SQL.
import { createHash } from 'node:crypto';

export interface BackcheckShareSettings {
  /** Share of each interviewer's completes selected (0.1 by default, common practice). */
  share: number;
  /** Added to an interviewer's share for each of their back-checks that did not confirm. */
  raiseAfterNotConfirmed: number;
}

/** A number in [0, 1) from the first 8 bytes of SHA-256 over "seed:interview id". */
export function selectionHash(seed: string, interviewId: string): number {
  const digest = createHash('sha256').update(`${seed}:${interviewId}`).digest();
  return Number(digest.readBigUInt64BE(0)) / 2 ** 64;
}

/** The interviewer's share now: the project's share, raised for each not-confirmed back-check, at most 1. */
export function currentShare(settings: BackcheckShareSettings, notConfirmed: number): number {
  return Math.min(1, settings.share + settings.raiseAfterNotConfirmed * notConfirmed);
}

/** What is known about one interviewer's back-checks in the project before the arrivals. */
export interface InterviewerBackchecks {
  selected: number;
  notConfirmed: number;
}

export interface Arrival {
  interviewId: string;
  interviewerId: string;
}

export interface Selection extends Arrival {
  shareAtSelection: number;
}

/**
 * The arrivals (new completes, in order) selected for a back-check: those whose hash falls
 * below their interviewer's current share, and an interviewer's first complete while they have
 * no back-check at all, so everyone with completes gets at least one.
 */
export function selectArrivals(
  seed: string,
  settings: BackcheckShareSettings,
  arrivals: readonly Arrival[],
  before: ReadonlyMap<string, InterviewerBackchecks>,
): Selection[] {
  const selectedSoFar = new Map<string, number>();
  const out: Selection[] = [];
  for (const arrival of arrivals) {
    const known = before.get(arrival.interviewerId) ?? { selected: 0, notConfirmed: 0 };
    const share = currentShare(settings, known.notConfirmed);
    const selected = known.selected + (selectedSoFar.get(arrival.interviewerId) ?? 0);
    if (selected === 0 || selectionHash(seed, arrival.interviewId) < share) {
      out.push({ ...arrival, shareAtSelection: share });
      selectedSoFar.set(arrival.interviewerId, (selectedSoFar.get(arrival.interviewerId) ?? 0) + 1);
    }
  }
  return out;
}
