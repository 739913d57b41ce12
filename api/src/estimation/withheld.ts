// When the share's interval, its margin of error and the implied bias factor's interval
// cannot be trusted, they are withheld and the reason is given instead (docs/methods.md,
// section 4). The thresholds are common practice, not a published standard: an effective
// sample size under 30 makes normal-theory intervals unreliable, and a category with fewer
// than 5 interviews makes its weights, and so every interval, hinge on a handful of people.
import { categoryOf } from './joint-names.js';
import type { MarginTarget } from './raking.js';

export const MIN_EFFECTIVE_SIZE = 30;
export const MIN_CATEGORY_INTERVIEWS = 5;

/** The figures withheld together when any reason holds. */
export const WITHHELD_FIGURES = ['standardError', 'interval', 'marginOfError', 'impliedBiasFactorInterval'] as const;
export type WithheldFigureName = (typeof WITHHELD_FIGURES)[number];

export interface WithheldFigure {
  figure: WithheldFigureName;
  reason: string;
}

export interface WithholdingInput {
  converged: boolean;
  iterations: number;
  maxMarginError: number;
  effectiveSampleSize: number;
  /** Kish's effective size of those who answered yes or no (the headline share's base). */
  answeredEffectiveSize?: number;
  cells: readonly { categories: Readonly<Record<string, string>>; count: number }[];
  targets: readonly MarginTarget[];
  /** Labels of interlocked quota cells that have a target but no interviews (known to the API only). */
  emptyInterlockedCells?: readonly string[];
}

/** Every reason that holds, in plain words; empty when the figures can be shown. */
export function withholdingReasons(input: WithholdingInput): string[] {
  const reasons: string[] = [];
  if (!input.converged) {
    const gap = (input.maxMarginError * 100).toFixed(2);
    reasons.push(`raking did not converge in ${input.iterations} sweeps (a weighted share is still ${gap} points off its target)`);
  }
  if (input.effectiveSampleSize < MIN_EFFECTIVE_SIZE) {
    reasons.push(`the effective sample size is ${input.effectiveSampleSize.toFixed(1)}, under ${MIN_EFFECTIVE_SIZE}`);
  }
  const answered = input.answeredEffectiveSize;
  if (answered !== undefined && answered < MIN_EFFECTIVE_SIZE && input.effectiveSampleSize >= MIN_EFFECTIVE_SIZE) {
    reasons.push(`the effective number who answered yes or no is ${answered.toFixed(1)}, under ${MIN_EFFECTIVE_SIZE}`);
  }
  for (const target of input.targets) {
    for (const { category, share } of target.shares) {
      if (share <= 0) continue;
      const count = input.cells.reduce((s, c) => s + (categoryOf(c.categories, target) === category ? c.count : 0), 0);
      if (count < MIN_CATEGORY_INTERVIEWS) {
        reasons.push(`${target.variable}: ${category} has ${count} ${count === 1 ? 'interview' : 'interviews'}, fewer than ${MIN_CATEGORY_INTERVIEWS}`);
      }
    }
  }
  for (const label of input.emptyInterlockedCells ?? []) {
    reasons.push(`the interlocked cell ${label} has a target but no interviews (merging it with a neighbouring category would let it be weighted)`);
  }
  return reasons;
}

/** One entry per withheld figure, all with the same reasons; empty when nothing is withheld. */
export function withheldFigures(reasons: readonly string[]): WithheldFigure[] {
  if (reasons.length === 0) return [];
  const reason = reasons.join('; ');
  return WITHHELD_FIGURES.map((figure) => ({ figure, reason }));
}
