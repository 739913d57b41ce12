// How much interviewers make their own interviews alike: the intra-interviewer correlation
// (Kish 1962) by the one-way analysis of variance estimator with unequal workloads, and the
// interviewer design effect it implies. Quota interviewers are not assigned at random, so the
// answer is first taken as its deviation from its cell's mean (area and cell effects removed).
// See docs/methods.md, "Interviewer checks".
import { EstimationInputError } from './errors.js';

export interface InterviewerCorrelation {
  /** ρ̂ = (MSB − MSW) / (MSB + (m₀ − 1)·MSW), set to 0 when negative. */
  rho: number;
  /** The estimate before negative values are set to 0. */
  rawRho: number;
  meanSquareBetween: number;
  meanSquareWithin: number;
  /** m₀ = (n − Σm_j²/n) / (J − 1). */
  m0: number;
  /** m* = Σm_j²/n, the workload-weighted mean workload. */
  mStar: number;
  /** 1 + ρ̂·(m* − 1). */
  designEffect: number;
  interviewers: number;
  interviews: number;
}

/**
 * The ANOVA estimator on values grouped by interviewer (each group one interviewer's values).
 * Null with fewer than 2 interviewers or no interview beyond one per interviewer.
 */
export function interviewerCorrelation(groups: number[][]): InterviewerCorrelation | null {
  groups.forEach((g, j) =>
    g.forEach((y, i) => {
      if (!Number.isFinite(y)) throw new EstimationInputError(`interviewer ${j + 1}, value ${i + 1}: must be a number, not ${y}`);
    }),
  );
  const used = groups.filter((g) => g.length > 0);
  const J = used.length;
  const n = used.reduce((s, g) => s + g.length, 0);
  if (J < 2 || n <= J) return null;
  const grand = used.reduce((s, g) => s + g.reduce((a, b) => a + b, 0), 0) / n;
  let between = 0;
  let within = 0;
  for (const g of used) {
    const mean = g.reduce((a, b) => a + b, 0) / g.length;
    between += g.length * (mean - grand) ** 2;
    within += g.reduce((s, y) => s + (y - mean) ** 2, 0);
  }
  const msb = between / (J - 1);
  const msw = within / (n - J);
  const sumSquares = used.reduce((s, g) => s + g.length ** 2, 0);
  const m0 = (n - sumSquares / n) / (J - 1);
  const mStar = sumSquares / n;
  const denominator = msb + (m0 - 1) * msw;
  const rawRho = denominator > 0 ? (msb - msw) / denominator : 0;
  const rho = Math.max(0, rawRho);
  return { rho, rawRho, meanSquareBetween: msb, meanSquareWithin: msw, m0, mStar, designEffect: 1 + rho * (mStar - 1), interviewers: J, interviews: n };
}

/** Each interview's value minus the mean of its cell, grouped by interviewer (in first-seen order). */
export function deviationsFromCellMeans(rows: { interviewer: string; cell: string; value: number }[]): Map<string, number[]> {
  const cells = new Map<string, { sum: number; n: number }>();
  for (const r of rows) {
    const c = cells.get(r.cell) ?? { sum: 0, n: 0 };
    c.sum += r.value;
    c.n += 1;
    cells.set(r.cell, c);
  }
  const groups = new Map<string, number[]>();
  for (const r of rows) {
    const c = cells.get(r.cell)!;
    const list = groups.get(r.interviewer) ?? [];
    list.push(r.value - c.sum / c.n);
    groups.set(r.interviewer, list);
  }
  return groups;
}

/**
 * The design effect from all sources the product measures: Kish's weighting design effect times
 * the interviewer design effect (Gabler, Häder & Lahiri 1999), with its effective sample size.
 */
export function allSourcesDesignEffect(weighting: number, interviewer: number, n: number): { designEffect: number; effectiveSampleSize: number } {
  if (!(weighting >= 1 - 1e-9) || !(interviewer >= 1 - 1e-9)) throw new EstimationInputError('design effects must be 1 or more');
  const designEffect = weighting * interviewer;
  return { designEffect, effectiveSampleSize: n / designEffect };
}
