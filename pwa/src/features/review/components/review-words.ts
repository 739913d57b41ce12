import type { ReviewItem } from '../api/get-review-queue';

export const statusWords: Record<ReviewItem['reviewStatus'], string> = {
  pending: 'Awaiting review',
  approved: 'Approved',
  rejected: 'Rejected',
};

/** A figure's name as words: "medianMinutes" → "median minutes". */
export function figureName(name: string): string {
  return name.replace(/([a-z])([A-Z])/g, '$1 $2').replace(/_/g, ' ').toLowerCase();
}

/** A figure's value: p-values and other small numbers keep their digits, others are rounded. */
export function figureValue(value: number | string): string {
  if (typeof value === 'string') return value;
  if (Math.abs(value) > 0 && Math.abs(value) < 0.01) return value.toPrecision(2);
  return String(Math.round(value * 1000) / 1000);
}

export function minutes(seconds: number): string {
  return `${Math.round(seconds / 6) / 10} min`;
}
