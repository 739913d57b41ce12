// The interviewer rule: whose headline answers differ from the rest of the sample more than
// chance allows once the cell mix is held fixed (Cochran–Mantel–Haenszel by category
// combination, Benjamini–Hochberg across interviewers: docs/methods.md section 11).
import { benjaminiHochberg, mantelHaenszel, type StratumCounts } from '../estimation/mantel-haenszel.js';
import type { QualitySettings } from './quality-settings.js';

/** A complete that answered the headline question yes or no, with its category combination. */
export interface AnsweredComplete {
  interviewerId: string;
  /** The interview's categories, one key per combination (e.g. the sorted category ids joined). */
  stratum: string;
  yes: boolean;
}

export interface InterviewerAnswerTest {
  interviewerId: string;
  completes: number;
  /** Null when not tested (too few completes, or nothing to test). */
  statistic: number | null;
  pValue: number | null;
  adjustedPValue: number | null;
  observedYes: number | null;
  expectedYes: number | null;
  strataUsed: number | null;
  flagged: boolean;
  /** In words, for the supervisor. */
  reason: string;
}

const percent = (x: number) => `${Math.round(x * 1000) / 10}%`;

export function interviewerAnswerTests(completes: AnsweredComplete[], settings: QualitySettings['interviewerAnswers']): InterviewerAnswerTest[] {
  const strata = [...new Set(completes.map((c) => c.stratum))];
  const interviewers = [...new Set(completes.map((c) => c.interviewerId))];
  // Counts per stratum and interviewer once; each test takes the others as the stratum minus this one.
  const total = new Map<string, { yes: number; no: number }>();
  const own = new Map<string, { yes: number; no: number }>();
  const countOf = new Map<string, number>();
  for (const c of completes) {
    countOf.set(c.interviewerId, (countOf.get(c.interviewerId) ?? 0) + 1);
    for (const [map, key] of [[total, c.stratum], [own, `${c.interviewerId}\u0000${c.stratum}`]] as const) {
      const cell = map.get(key) ?? { yes: 0, no: 0 };
      if (c.yes) cell.yes++;
      else cell.no++;
      map.set(key, cell);
    }
  }
  const tested = interviewers.map((id) => {
    const count = countOf.get(id)!;
    if (count < settings.minimumCompletes) return { id, count, result: null };
    const tables: StratumCounts[] = strata.map((s) => {
      const all = total.get(s)!;
      const mine = own.get(`${id}\u0000${s}`) ?? { yes: 0, no: 0 };
      return { thisYes: mine.yes, thisNo: mine.no, otherYes: all.yes - mine.yes, otherNo: all.no - mine.no };
    });
    return { id, count, result: mantelHaenszel(tables) };
  });
  const withP = tested.filter((t) => t.result !== null);
  const adjusted = benjaminiHochberg(withP.map((t) => t.result!.pValue));
  const adjustedOf = new Map(withP.map((t, k) => [t.id, adjusted[k] as number]));
  return tested.map(({ id, count, result }) => {
    if (!result) {
      return {
        interviewerId: id, completes: count, statistic: null, pValue: null, adjustedPValue: null, observedYes: null, expectedYes: null, strataUsed: null, flagged: false,
        reason: count < settings.minimumCompletes ? `Not tested: ${count} completes, fewer than ${settings.minimumCompletes}` : 'Not tested: every answer in the cells this interviewer worked is the same',
      };
    }
    const q = adjustedOf.get(id)!;
    const flagged = q < settings.falseDiscoveryRate;
    const rate = result.observedYes / result.interviews;
    const expectedRate = result.expectedYes / result.interviews;
    return {
      interviewerId: id, completes: count, statistic: result.statistic, pValue: result.pValue, adjustedPValue: q,
      observedYes: result.observedYes, expectedYes: result.expectedYes, strataUsed: result.strataUsed, flagged,
      reason: `${percent(rate)} yes where the others' answers in the same cells give ${percent(expectedRate)}; p = ${result.pValue.toPrecision(2)}, ${flagged ? 'below' : 'not below'} ${settings.falseDiscoveryRate} after adjusting for ${withP.length} interviewers tested (adjusted p = ${q.toPrecision(2)})`,
    };
  });
}
