// Does one interviewer's headline answer differ from everyone else's once the cell mix is held
// fixed? The Cochran–Mantel–Haenszel test on 2 × 2 × K tables (this interviewer or the others ×
// yes or no, one table per category combination), and Benjamini–Hochberg control of the false
// discovery rate across interviewers. See docs/methods.md, "Interviewer checks".
import { EstimationInputError } from './errors.js';
import { jStat } from './jstat.js';

/** One stratum's counts: this interviewer's and the others' yes and no answers. */
export interface StratumCounts {
  thisYes: number;
  thisNo: number;
  otherYes: number;
  otherNo: number;
}

export interface MantelHaenszelResult {
  /** (Σa − ΣE[a])² / ΣVar[a], no continuity correction. */
  statistic: number;
  /** Two-sided, from the chi-square distribution with 1 degree of freedom (not exact). */
  pValue: number;
  /** Strata that entered the test, and those dropped (fewer than 2 interviews, or none by this interviewer). */
  strataUsed: number;
  strataDropped: number;
  /** This interviewer's yes answers, and how many the others' rates within the same strata would give. */
  observedYes: number;
  expectedYes: number;
  /** This interviewer's interviews in the strata used. */
  interviews: number;
}

function checkCount(value: number, what: string): void {
  if (!Number.isInteger(value) || value < 0) throw new EstimationInputError(`${what} must be a whole number of 0 or more, not ${value}`);
}

/**
 * The CMH test as R's `mantelhaen.test(x, correct = FALSE)` gives it for a 2 × 2 × K table, on
 * the strata with at least 2 interviews and at least one by this interviewer. Null when no
 * stratum is left or every stratum's variance is zero (nothing to test).
 */
export function mantelHaenszel(strata: StratumCounts[]): MantelHaenszelResult | null {
  let observed = 0;
  let expected = 0;
  let variance = 0;
  let used = 0;
  let own = 0;
  strata.forEach((s, k) => {
    for (const key of ['thisYes', 'thisNo', 'otherYes', 'otherNo'] as const) checkCount(s[key], `stratum ${k + 1}: ${key}`);
  });
  for (const s of strata) {
    const rowThis = s.thisYes + s.thisNo;
    const rowOther = s.otherYes + s.otherNo;
    const n = rowThis + rowOther;
    if (n < 2 || rowThis === 0) continue;
    const colYes = s.thisYes + s.otherYes;
    const colNo = s.thisNo + s.otherNo;
    used += 1;
    own += rowThis;
    observed += s.thisYes;
    expected += (rowThis * colYes) / n;
    variance += (rowThis * rowOther * colYes * colNo) / (n * n * (n - 1));
  }
  if (used === 0 || variance <= 0) return null;
  const statistic = (observed - expected) ** 2 / variance;
  return {
    statistic,
    pValue: 1 - jStat.chisquare.cdf(statistic, 1),
    strataUsed: used,
    strataDropped: strata.length - used,
    observedYes: observed,
    expectedYes: expected,
    interviews: own,
  };
}

/**
 * Benjamini–Hochberg adjusted p-values (R: `p.adjust(p, method = "BH")`): p(i) · m / i taken
 * as the running minimum from the largest p down, capped at 1, in the input's order.
 */
export function benjaminiHochberg(pValues: number[]): number[] {
  pValues.forEach((p, i) => {
    if (!(p >= 0 && p <= 1)) throw new EstimationInputError(`p-value ${i + 1} must lie between 0 and 1, not ${p}`);
  });
  const m = pValues.length;
  const order = pValues.map((p, i) => ({ p, i })).sort((a, b) => b.p - a.p);
  const adjusted = new Array<number>(m);
  let running = 1;
  order.forEach(({ p, i }, rankFromTop) => {
    const rank = m - rankFromTop;
    running = Math.min(running, (p * m) / rank);
    adjusted[i] = Math.min(1, running);
  });
  return adjusted;
}
