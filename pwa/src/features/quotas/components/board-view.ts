// Sorting and filtering of the board's cells: plain functions, so the table and the phone
// list show the same selection in the same order.
import type { Cell, CellStatus } from '../api/get-quota-board';

export type SortColumn = 'label' | 'target' | 'achieved' | 'remaining' | 'fillRate' | 'status';
export type SortDirection = 'ascending' | 'descending';
export type StatusFilter = 'all' | CellStatus | 'over_quota';

export interface BoardView {
  sortBy: SortColumn;
  direction: SortDirection;
  status: StatusFilter;
  text: string;
}

export const initialView: BoardView = { sortBy: 'label', direction: 'ascending', status: 'all', text: '' };

export const statusWords: Record<CellStatus, string> = {
  open: 'Open',
  nearly_full: 'Nearly full',
  full: 'Full',
  closed: 'Closed',
};

// Order of urgency for sorting by status: what needs a decision first.
const statusOrder: Record<CellStatus, number> = { open: 0, nearly_full: 1, full: 2, closed: 3 };

function compare(a: Cell, b: Cell, column: SortColumn): number {
  if (column === 'label') return a.label.localeCompare(b.label, 'en', { numeric: true });
  if (column === 'status') return statusOrder[a.status] - statusOrder[b.status];
  return a[column] - b[column];
}

export function visibleCells(cells: Cell[], view: BoardView): Cell[] {
  const text = view.text.trim().toLowerCase();
  const chosen = cells.filter((cell) => {
    if (view.status === 'over_quota' ? cell.overQuota === 0 : view.status !== 'all' && cell.status !== view.status) return false;
    return text === '' || cell.label.toLowerCase().includes(text);
  });
  const sign = view.direction === 'ascending' ? 1 : -1;
  // Ties keep the server's order (the cells' set-up order), so the list never jumps about.
  return chosen
    .map((cell, index) => ({ cell, index }))
    .sort((a, b) => sign * compare(a.cell, b.cell, view.sortBy) || a.index - b.index)
    .map(({ cell }) => cell);
}

/** Clicking the sorted column turns its direction; another column starts ascending. */
export function sortedBy(view: BoardView, column: SortColumn): BoardView {
  if (view.sortBy === column) return { ...view, direction: view.direction === 'ascending' ? 'descending' : 'ascending' };
  return { ...view, sortBy: column, direction: 'ascending' };
}
