// The quality rules that look at one interviewer's timing: too short, overlapping, out of hours
// and bursts. Pure functions over a project's interviews, so flags can be recomputed whenever
// the data grows (the median moves) or the lead changes a threshold.
import { median } from 'simple-statistics';
import type { QualitySettings } from './quality-settings.js';

export interface TimedInterview {
  id: string;
  interviewerId: string;
  disposition: string;
  startedAt: Date;
  endedAt: Date;
}

export type TimingRule = 'too_short' | 'overlapping' | 'out_of_hours' | 'burst';

/** A rule an interview trips, with its reason in words and the numbers behind it. */
export interface RuleFinding {
  rule: TimingRule;
  reason: string;
  figures: Record<string, number | string>;
}

const minutes = (ms: number) => ms / 60_000;
const round1 = (x: number) => Math.round(x * 10) / 10;

/** The local time of day HH:MM of an instant in a time zone. */
const clocks = new Map<string, Intl.DateTimeFormat>();
export function localTime(at: Date, timeZone: string): string {
  // Making a formatter costs far more than using one: one per time zone.
  let clock = clocks.get(timeZone);
  if (!clock) {
    clock = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
    clocks.set(timeZone, clock);
  }
  const parts = clock.formatToParts(at);
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? '00';
  return `${get('hour')}:${get('minute')}`;
}

function add(findings: Map<string, RuleFinding[]>, id: string, finding: RuleFinding): void {
  const list = findings.get(id) ?? [];
  list.push(finding);
  findings.set(id, list);
}

function tooShort(interviews: TimedInterview[], settings: QualitySettings['tooShort'], findings: Map<string, RuleFinding[]>): void {
  const completes = interviews.filter((i) => i.disposition === 'complete');
  if (completes.length === 0) return;
  const durations = completes.map((i) => minutes(i.endedAt.getTime() - i.startedAt.getTime()));
  const medianMinutes = median(durations);
  const byMedian = medianMinutes * settings.fractionOfMedian;
  completes.forEach((interview, k) => {
    const took = durations[k] as number;
    const underMedian = took < byMedian;
    const underMinimum = settings.minimumMinutes !== null && took < settings.minimumMinutes;
    if (!underMedian && !underMinimum) return;
    const limit = underMinimum && settings.minimumMinutes !== null ? `the minimum of ${round1(settings.minimumMinutes)} min` : `${round1(settings.fractionOfMedian * 100)}% of the median complete (${round1(medianMinutes)} min) is ${round1(byMedian)} min`;
    add(findings, interview.id, {
      rule: 'too_short',
      reason: `Took ${round1(took)} min; ${limit}`,
      figures: { minutes: round1(took), medianMinutes: round1(medianMinutes), thresholdMinutes: round1(underMinimum && settings.minimumMinutes !== null ? settings.minimumMinutes : byMedian) },
    });
  });
}

function byInterviewer(interviews: TimedInterview[]): TimedInterview[][] {
  const groups = new Map<string, TimedInterview[]>();
  for (const i of interviews) {
    const own = groups.get(i.interviewerId);
    if (own) own.push(i);
    else groups.set(i.interviewerId, [i]);
  }
  return [...groups.values()];
}

function overlapping(interviews: TimedInterview[], findings: Map<string, RuleFinding[]>): void {
  for (const own of byInterviewer(interviews)) {
    const sorted = [...own].sort((a, b) => a.startedAt.getTime() - b.startedAt.getTime());
    // Sweep by start time: each interview overlaps the ones still running when it starts.
    let running: TimedInterview[] = [];
    for (const interview of sorted) {
      running = running.filter((r) => r.endedAt.getTime() > interview.startedAt.getTime());
      for (const other of running) {
        const overlapMinutes = round1(minutes(Math.min(other.endedAt.getTime(), interview.endedAt.getTime()) - interview.startedAt.getTime()));
        add(findings, interview.id, { rule: 'overlapping', reason: `Overlaps another interview by the same interviewer by ${overlapMinutes} min`, figures: { otherInterview: other.id, overlapMinutes } });
        add(findings, other.id, { rule: 'overlapping', reason: `Overlaps another interview by the same interviewer by ${overlapMinutes} min`, figures: { otherInterview: interview.id, overlapMinutes } });
      }
      running.push(interview);
    }
  }
}

function outOfHours(interviews: TimedInterview[], settings: QualitySettings['outOfHours'], timeZone: string, findings: Map<string, RuleFinding[]>): void {
  for (const interview of interviews) {
    const at = localTime(interview.startedAt, timeZone);
    const inside = settings.from <= settings.to ? at >= settings.from && at < settings.to : at >= settings.from || at < settings.to;
    if (inside) continue;
    add(findings, interview.id, { rule: 'out_of_hours', reason: `Started at ${at}, outside the hours ${settings.from}–${settings.to} (${timeZone})`, figures: { startedAt: at, from: settings.from, to: settings.to } });
  }
}

function bursts(interviews: TimedInterview[], settings: QualitySettings['bursts'], findings: Map<string, RuleFinding[]>): void {
  const hour = 3_600_000;
  for (const own of byInterviewer(interviews.filter((i) => i.disposition === 'complete'))) {
    const sorted = [...own].sort((a, b) => a.endedAt.getTime() - b.endedAt.getTime());
    const flagged = new Map<string, number>();
    // Each window of one hour from a complete's end: more than perHour completes in it flags them all.
    let last = 0;
    for (let first = 0; first < sorted.length; first++) {
      last = Math.max(last, first);
      while (last + 1 < sorted.length && sorted[last + 1]!.endedAt.getTime() - sorted[first]!.endedAt.getTime() < hour) last++;
      const count = last - first + 1;
      if (count <= settings.perHour) continue;
      for (let k = first; k <= last; k++) flagged.set(sorted[k]!.id, Math.max(flagged.get(sorted[k]!.id) ?? 0, count));
    }
    for (const [id, count] of flagged) {
      add(findings, id, { rule: 'burst', reason: `One of ${count} completes by this interviewer within an hour (more than ${settings.perHour})`, figures: { completesInHour: count, limit: settings.perHour } });
    }
  }
}

/** Every timing rule the settings switch on, over a project's interviews: findings by interview id. */
export function timingFindings(interviews: TimedInterview[], settings: QualitySettings, timeZone: string): Map<string, RuleFinding[]> {
  const findings = new Map<string, RuleFinding[]>();
  if (settings.tooShort.enabled) tooShort(interviews, settings.tooShort, findings);
  if (settings.overlapping.enabled) overlapping(interviews, findings);
  if (settings.outOfHours.enabled) outOfHours(interviews, settings.outOfHours, timeZone, findings);
  if (settings.bursts.enabled) bursts(interviews, settings.bursts, findings);
  return findings;
}
