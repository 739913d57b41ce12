const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const countFormat = new Intl.NumberFormat('en-GB');

/** "2026-03-02" or an ISO timestamp → "2 Mar 2026"; anything unreadable is shown as given. */
export function formatDate(value: string | null | undefined): string {
  if (!value) return '—';
  const date = new Date(/^\d{4}-\d{2}-\d{2}$/.test(value) ? `${value}T00:00:00` : value);
  return Number.isNaN(date.getTime()) ? value : dateFormat.format(date);
}

export function formatCount(value: number): string {
  return countFormat.format(value);
}
