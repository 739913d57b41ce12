import { describe, expect, it } from 'vitest';
import { localTime, timingFindings, type TimedInterview } from './interview-rules.js';
import { DEFAULT_QUALITY_SETTINGS, type QualitySettings } from './quality-settings.js';

const ZONE = 'Europe/London';
let next = 0;
/** A complete by interviewer `who` starting at HH:MM on 2026-12-02 (London is on UTC in December), lasting `minutes`. */
function interview(who: string, start: string, minutes: number, disposition = 'complete'): TimedInterview {
  const startedAt = new Date(`2026-12-02T${start}:00Z`);
  return { id: `i${++next}`, interviewerId: who, disposition, startedAt, endedAt: new Date(startedAt.getTime() + minutes * 60_000) };
}
const only = (rule: keyof QualitySettings, change: Partial<QualitySettings[keyof QualitySettings]> = {}): QualitySettings => {
  const off = Object.fromEntries(Object.entries(DEFAULT_QUALITY_SETTINGS).map(([k, v]) => [k, { ...v, enabled: false }])) as unknown as QualitySettings;
  return { ...off, [rule]: { ...DEFAULT_QUALITY_SETTINGS[rule], ...change, enabled: true } };
};
const rulesOf = (findings: Map<string, { rule: string }[]>, id: string) => (findings.get(id) ?? []).map((f) => f.rule);

describe('too short', () => {
  // Median of 6, 18, 18, 21, 24 is 18 min: a third of it is 6 min.
  const set = [interview('a', '10:00', 6), interview('a', '11:00', 18), interview('b', '10:00', 18), interview('b', '11:00', 21), interview('c', '10:00', 5.9)];
  it('flags a complete under a third of the median, not one at it, with the numbers in words', () => {
    const findings = timingFindings([...set.slice(0, 4), interview('c', '12:00', 24)], only('tooShort'), ZONE);
    expect(findings.size).toBe(0);
    const withShort = timingFindings([...set.slice(1), interview('a', '12:00', 24)], only('tooShort'), ZONE);
    expect(rulesOf(withShort, set[4]!.id)).toEqual(['too_short']);
    expect(withShort.get(set[4]!.id)![0]).toMatchObject({ reason: 'Took 5.9 min; 33.3% of the median complete (18 min) is 6 min' });
  });

  it('also flags a complete under the lead\'s absolute minimum, and never a partial', () => {
    const partial = interview('a', '13:00', 1, 'partial');
    const findings = timingFindings([...set, partial], only('tooShort', { minimumMinutes: 19 }), ZONE);
    expect(rulesOf(findings, set[1]!.id)).toEqual(['too_short']);
    expect(findings.get(set[1]!.id)![0]!.reason).toBe('Took 18 min; the minimum of 19 min');
    expect(rulesOf(findings, set[3]!.id)).toEqual([]);
    expect(rulesOf(findings, partial.id)).toEqual([]);
  });
});

describe('overlapping', () => {
  it('flags both interviews when one interviewer\'s spans overlap; touching end to start is not an overlap', () => {
    const first = interview('a', '10:00', 30);
    const touching = interview('a', '10:30', 20);
    const inside = interview('a', '10:40', 5);
    const otherPerson = interview('b', '10:05', 30);
    const findings = timingFindings([first, touching, inside, otherPerson], only('overlapping'), ZONE);
    expect(rulesOf(findings, first.id)).toEqual([]);
    expect(rulesOf(findings, touching.id)).toEqual(['overlapping']);
    expect(findings.get(inside.id)![0]).toMatchObject({ reason: 'Overlaps another interview by the same interviewer by 5 min', figures: { otherInterview: touching.id } });
    expect(rulesOf(findings, otherPerson.id)).toEqual([]);
  });
});

describe('out of hours', () => {
  it('flags a start before 08:00 or at 21:00 and after in the project\'s time zone', () => {
    const early = interview('a', '07:59', 10);
    const opening = interview('a', '08:00', 10);
    const lastMinute = interview('a', '20:59', 10);
    const closing = interview('a', '21:00', 10);
    const findings = timingFindings([early, opening, lastMinute, closing], only('outOfHours'), ZONE);
    expect([early, opening, lastMinute, closing].map((i) => rulesOf(findings, i.id).length)).toEqual([1, 0, 0, 1]);
    expect(findings.get(early.id)![0]!.reason).toBe('Started at 07:59, outside the hours 08:00–21:00 (Europe/London)');
  });

  it('reads the time of day in the project\'s zone (Auckland is 13 hours ahead in December)', () => {
    expect(localTime(new Date('2026-12-02T19:30:00Z'), 'Pacific/Auckland')).toBe('08:30');
    const findings = timingFindings([interview('a', '19:30', 10)], only('outOfHours'), 'Pacific/Auckland');
    expect(findings.size).toBe(0);
  });
});

describe('bursts', () => {
  it('flags more than 4 completes within an hour (5 do, 4 do not), and only those in the window', () => {
    const four = ['10:00', '10:10', '10:20', '10:30'].map((t) => interview('a', t, 5));
    expect(timingFindings(four, only('bursts'), ZONE).size).toBe(0);
    const fifth = interview('a', '10:59', 5); // ends 11:04, within an hour of the first's end at 10:05
    const later = interview('a', '12:30', 5);
    const findings = timingFindings([...four, fifth, later], only('bursts'), ZONE);
    expect([...four, fifth].every((i) => rulesOf(findings, i.id).includes('burst'))).toBe(true);
    expect(rulesOf(findings, later.id)).toEqual([]);
    expect(findings.get(fifth.id)![0]!.reason).toBe('One of 5 completes by this interviewer within an hour (more than 4)');
  });

  it('follows the lead\'s limit', () => {
    const five = ['10:00', '10:10', '10:20', '10:30', '10:40'].map((t) => interview('a', t, 5));
    expect(timingFindings(five, only('bursts', { perHour: 5 }), ZONE).size).toBe(0);
  });
});

describe('switched off', () => {
  it('finds nothing when every rule is off', () => {
    const off = Object.fromEntries(Object.entries(DEFAULT_QUALITY_SETTINGS).map(([k, v]) => [k, { ...v, enabled: false }])) as unknown as QualitySettings;
    expect(timingFindings([interview('a', '03:00', 1), interview('a', '03:00', 1)], off, ZONE).size).toBe(0);
  });
});
