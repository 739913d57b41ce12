import { formatCount, formatPercent } from '../../../lib/format';
import type { Cell } from '../api/get-quota-board';
import { type BoardView, type SortColumn } from './board-view';
import { CellStatusTag } from './cell-status-tag';
import { CellToggleButton } from './cell-toggle-button';
import { FillBar } from './fill-bar';
import { ScrollBox } from '../../../components/scroll-box';
import { heading, WORDS } from '../../../lib/glossary';

interface CellTableProps {
  cells: Cell[];
  view: BoardView;
  onSort: (column: SortColumn) => void;
  /** Offer close / reopen (supervisor and lead). */
  onToggle?: (cell: Cell) => void;
}

const columns: { key: SortColumn; label: string; numeric?: boolean }[] = [
  { key: 'label', label: heading(WORDS.cell.one) },
  { key: 'target', label: heading(WORDS.target.one), numeric: true },
  { key: 'achieved', label: heading(WORDS.achieved.one), numeric: true },
  { key: 'remaining', label: 'Remaining', numeric: true },
  { key: 'fillRate', label: 'Fill', numeric: true },
  { key: 'status', label: 'Status' },
];

/** The desktop board: one row per cell, sortable by any column. */
export function CellTable({ cells, view, onSort, onToggle }: CellTableProps) {
  return (
    <ScrollBox label="Cells, scrolls sideways">
      <table className="pl-table pl-cell-table" aria-label="Cells">
        <thead>
          <tr>
            {columns.map((column) => {
              const sorted = view.sortBy === column.key;
              return (
                <th
                  key={column.key}
                  scope="col"
                  aria-sort={sorted ? view.direction : 'none'}
                  className={column.numeric ? 'is-numeric' : undefined}
                >
                  <button type="button" className="pl-sort" onClick={() => onSort(column.key)}>
                    {column.label}
                    <span className="pl-sort-mark" aria-hidden="true">
                      {sorted ? (view.direction === 'ascending' ? '▲' : '▼') : '↕'}
                    </span>
                  </button>
                </th>
              );
            })}
            {onToggle ? (
              <th scope="col">
                <span className="pl-visually-hidden">Change</span>
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {cells.map((cell) => (
            <tr key={cell.id} className={`pl-row-${cell.status}`}>
              <th scope="row" className="pl-cell-label">
                {cell.label}
                {cell.overQuota > 0 ? <span className="pl-over"> {formatCount(cell.overQuota)} {WORDS.overQuota.one}</span> : null}
              </th>
              <td className="is-numeric pl-figure">{formatCount(cell.target)}</td>
              <td className="is-numeric pl-figure">{formatCount(cell.achieved)}</td>
              <td className="is-numeric pl-figure">{formatCount(cell.remaining)}</td>
              <td className="is-numeric">
                <span className="pl-fill-cell">
                  <FillBar fillRate={cell.fillRate} status={cell.status} />
                  <span className="pl-figure">{formatPercent(cell.fillRate, 0)}</span>
                </span>
              </td>
              <td>
                <CellStatusTag status={cell.status} />
              </td>
              {onToggle ? (
                <td>
                  <CellToggleButton cell={cell} onToggle={onToggle} />
                </td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollBox>
  );
}
