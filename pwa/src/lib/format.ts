const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const calendarFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const countFormat = new Intl.NumberFormat('en-GB');

/**
 * A calendar date such as a field start ("2026-11-16" or "2026-11-16T00:00:00.000Z") →
 * "16 Nov 2026", the same day in every time zone. Anything unreadable is shown as given.
 */
export function formatCalendarDate(value: string | null | undefined): string {
  if (!value) return '—';
  const day = /^(\d{4})-(\d{2})-(\d{2})/.exec(value);
  if (!day) return value;
  const date = new Date(Date.UTC(Number(day[1]), Number(day[2]) - 1, Number(day[3])));
  return Number.isNaN(date.getTime()) ? value : calendarFormat.format(date);
}

/** A moment (ISO timestamp) → its day in the viewer's time zone, e.g. "2 Dec 2026". */
export function formatDate(value: string | null | undefined): string {
  if (!value) return '—';
  const date = new Date(value);
  return Number.isNaN(date.getTime()) ? value : dateFormat.format(date);
}

export function formatCount(value: number): string {
  return countFormat.format(value);
}

const clockFormat = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });

/** A moment (ISO timestamp) → "14:05" in the viewer's time zone. */
export function formatClock(value: string | null | undefined): string {
  if (!value) return '—';
  const date = new Date(value);
  return Number.isNaN(date.getTime()) ? value : clockFormat.format(date);
}

/** A proportion (0.4828) → "48.3%". Shares are proportions in the code, percentages on screen. */
export function formatPercent(share: number | null | undefined, digits = 1): string {
  if (share === null || share === undefined || !Number.isFinite(share)) return '—';
  return `${(share * 100).toFixed(digits)}%`;
}

/** A difference of two proportions → signed percentage points, e.g. "+7.9 pts" or "−3.1 pts". */
export function formatPoints(difference: number, digits = 1): string {
  const points = Number((difference * 100).toFixed(digits));
  if (points === 0) return `0.${'0'.repeat(digits)} pts`;
  return `${points > 0 ? '+' : '−'}${Math.abs(points).toFixed(digits)} pts`;
}

/** A plain number with fixed decimals, e.g. a design effect 1.2052 → "1.21". */
export function formatDecimal(value: number | null | undefined, digits = 2): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return value.toFixed(digits);
}

const momentFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

/** A moment (ISO timestamp) → "14:05" today, "3 Dec, 14:05" on another day, in the viewer's time zone. */
export function formatMoment(value: string | null | undefined, now = new Date()): string {
  if (!value) return '—';
  const date = new Date(value);
  if (Number.isNaN(date.getTime())) return value;
  return date.toDateString() === now.toDateString() ? `today ${clockFormat.format(date)}` : momentFormat.format(date);
}
