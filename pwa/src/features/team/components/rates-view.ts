// Sorting the interviewers' rates: plain functions, so the desktop table and the phone cards
// show the same order. Missing figures (no contacts yet, no test) sort last either way.
import type { InterviewerRates } from '../api/get-interviewer-rates';

export type RatesColumn =
  | 'name' | 'contacts' | 'completes' | 'COOP1' | 'REF2' | 'CON2' | 'medianDurationSeconds' | 'flags' | 'adjustedPValue' | 'notConfirmed';
export type SortDirection = 'ascending' | 'descending';
export interface RatesSort {
  column: RatesColumn;
  direction: SortDirection;
}

/** Each column's heading in the table (short) and in the phone's sort choice (in words). */
export const ratesColumns: { key: RatesColumn; short: string; label: string; numeric: boolean }[] = [
  { key: 'name', short: 'Interviewer', label: 'Interviewer', numeric: false },
  { key: 'contacts', short: 'Contacts', label: 'Contacts', numeric: true },
  { key: 'completes', short: 'Completes', label: 'Completes', numeric: true },
  { key: 'COOP1', short: 'COOP1', label: 'Cooperation (COOP1)', numeric: true },
  { key: 'REF2', short: 'REF2', label: 'Refusal (REF2)', numeric: true },
  { key: 'CON2', short: 'CON2', label: 'Contact (CON2)', numeric: true },
  { key: 'medianDurationSeconds', short: 'Median length', label: 'Median length', numeric: true },
  { key: 'flags', short: 'Flags', label: 'Flags', numeric: true },
  { key: 'adjustedPValue', short: 'Adjusted p', label: 'Answer test, adjusted p', numeric: true },
  { key: 'notConfirmed', short: 'Not confirmed', label: 'Back-checks not confirmed', numeric: true },
];

/** Timing findings on interviews not approved, plus one when the answer test flags them. */
export function flagCount(row: InterviewerRates): number {
  return row.findings.reduce((sum, f) => sum + f.count, 0) + (row.test?.flagged ? 1 : 0);
}

function value(row: InterviewerRates, column: RatesColumn): number | string | null {
  switch (column) {
    case 'name':
      return row.name;
    case 'COOP1':
    case 'REF2':
    case 'CON2':
      return row.rates[column];
    case 'flags':
      return flagCount(row);
    case 'adjustedPValue':
      return row.test?.adjustedPValue ?? null;
    case 'notConfirmed':
      return row.backchecks.notConfirmed;
    default:
      return row[column];
  }
}

export function sortRates(rows: InterviewerRates[], sort: RatesSort): InterviewerRates[] {
  const sign = sort.direction === 'ascending' ? 1 : -1;
  return [...rows].sort((a, b) => {
    const [x, y] = [value(a, sort.column), value(b, sort.column)];
    if (x === null || y === null) return x === y ? 0 : x === null ? 1 : -1;
    const order = typeof x === 'string' ? x.localeCompare(String(y), 'en') : x - (y as number);
    return order * sign || a.name.localeCompare(b.name, 'en');
  });
}

/** A click on a column's heading: that column, or the other direction when it is already chosen. */
export function sortedBy(sort: RatesSort, column: RatesColumn): RatesSort {
  if (sort.column === column) return { column, direction: sort.direction === 'ascending' ? 'descending' : 'ascending' };
  return { column, direction: column === 'name' ? 'ascending' : 'descending' };
}

/** Seconds → "14 min" or "1 h 05 min". */
export function formatDuration(seconds: number | null): string {
  if (seconds === null) return '—';
  const minutes = Math.round(seconds / 60);
  return minutes < 60 ? `${minutes} min` : `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

/** A p-value as researchers read it: three decimals, "< 0.001" below that. */
export function formatP(p: number | null | undefined): string {
  if (p === null || p === undefined) return '—';
  return p < 0.001 ? '< 0.001' : p.toFixed(3);
}
