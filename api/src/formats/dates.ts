const CALENDAR_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/**
 * True for a calendar date written YYYY-MM-DD that exists (2026-02-29 does not). The other
 * ISO 8601 forms (20261201, 2026-W01, 2026-324, 2026) are refused: people and PostgreSQL's
 * date type read them differently, and the screens show only this form.
 */
export function isCalendarDate(value: unknown): value is string {
  const m = typeof value === 'string' ? CALENDAR_DATE.exec(value) : null;
  if (!m) return false;
  const [year, month, day] = m.slice(1).map(Number) as [number, number, number];
  const date = new Date(Date.UTC(year, month - 1, day));
  return year >= 1 && date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}
