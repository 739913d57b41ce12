// How the balance figures are put into words. Shares are proportions in the code and
// percentages on screen (docs/methods.md, introduction).
import { formatDecimal, formatPercent } from '../../../lib/format';

/** A margin of error (a proportion) → "±4.8 pts" (percentage points). */
export function formatMarginOfError(moe: number): string {
  return `±${(moe * 100).toFixed(1)} pts`;
}

/** A share's interval → "44.0% – 52.1%". */
export function formatShareInterval([lower, upper]: [number, number]): string {
  return `${formatPercent(lower)} – ${formatPercent(upper)}`;
}

/**
 * The ± figure of a share's interval, only when its two half-widths are within 10% of each
 * other (the same rule as the server's symmetricHalfWidth); null for a lopsided interval.
 */
export function symmetricHalfWidth(share: number, [lower, upper]: [number, number]): number | null {
  const below = share - lower;
  const above = upper - share;
  const larger = Math.max(below, above);
  if (!(larger > 0)) return null;
  return Math.abs(below - above) <= 0.1 * larger ? (below + above) / 2 : null;
}

/** A bias factor → three decimals, e.g. "0.503". */
export function formatBiasFactor(b: number): string {
  return formatDecimal(b, 3);
}

/**
 * What the implied bias factor says about the raw sample. b = 0.5 is no pull; above 0.5
 * the raw (unweighted) sample overstates the headline share, below it understates it. Only
 * an interval that excludes 0.5 is read as a clear pull.
 */
export function biasSentence(interval: [number, number], unweighted: number, weighted: number): string {
  const [low, high] = interval;
  const shares = `${formatPercent(unweighted)} before weighting, ${formatPercent(weighted)} after`;
  if (low > 0.5) return `The raw sample overstates the headline share against the weighted figure (${shares}): the whole interval lies above 0.5.`;
  if (high < 0.5) return `The raw sample understates the headline share against the weighted figure (${shares}): the whole interval lies below 0.5.`;
  return `No clear pull either way so far (${shares}): the interval includes 0.5.`;
}
