import { formatCalendarDate, formatCount } from '../../../lib/format';
import type { Projection } from '../api/get-projection';

/** A chance as a whole percentage, with "under 1%" and "over 99%" rather than 0% and 100% when not sure. */
export function formatChance(p: number): string {
  if (p === 0) return '0%';
  if (p === 1) return '100%';
  if (p < 0.01) return 'under 1%';
  if (p > 0.99) return 'over 99%';
  return `${Math.round(p * 100)}%`;
}

export function formatPace(pace: number): string {
  return pace >= 10 ? formatCount(Math.round(pace)) : pace.toFixed(1);
}

/** One sentence a lead acts on: will the target be reached by the field end, and when. */
export function projectionSentence(p: Projection): string | null {
  if (p.pacePerDay === null) return null;
  if (p.targetReached) return `The target of ${formatCount(p.target)} completes is reached.`;
  const date = p.targetDate ? formatCalendarDate(p.targetDate.expected) : null;
  if (p.atEnd && p.fieldEnd) {
    const end = `${formatCount(Math.round(p.atEnd.expected))} completes expected by the field end (${formatCalendarDate(p.fieldEnd)})`;
    if (p.atEnd.expected >= p.target) return `On track: ${end}; the target of ${formatCount(p.target)} is reached around ${date}.`;
    return `Short of the target: ${end}, against a target of ${formatCount(p.target)}.${date ? ` At this pace it is reached around ${date}.` : ''}`;
  }
  return date ? `At this pace the target of ${formatCount(p.target)} is reached around ${date}.` : 'No completes over the last field days: at this pace the target is not reached.';
}
