import { formatCount, formatPercent } from '../../../lib/format';
import type { Cell } from '../api/get-quota-board';
import { CellStatusTag } from './cell-status-tag';
import { CellToggleButton } from './cell-toggle-button';
import { FillBar } from './fill-bar';
import { WORDS } from '../../../lib/glossary';

interface CellListProps {
  cells: Cell[];
  onToggle?: (cell: Cell) => void;
}

/** The phone board: status, label, achieved of target and a fill bar per cell. */
export function CellList({ cells, onToggle }: CellListProps) {
  return (
    <ul className="pl-cell-list" aria-label="Cells">
      {cells.map((cell) => (
        <li key={cell.id} className={`pl-cell-item pl-row-${cell.status}`}>
          <div className="pl-cell-item-head">
            <CellStatusTag status={cell.status} />
            <span className="pl-figure pl-cell-count">
              {formatCount(cell.achieved)} / {formatCount(cell.target)}
            </span>
          </div>
          <p className="pl-cell-item-label">{cell.label}</p>
          <div className="pl-cell-item-fill">
            <FillBar fillRate={cell.fillRate} status={cell.status} />
            <span className="pl-figure pl-small">{formatPercent(cell.fillRate, 0)}</span>
          </div>
          <div className="pl-cell-item-foot">
            <span className="pl-small pl-muted">
              {formatCount(cell.remaining)} to go
              {cell.overQuota > 0 ? <span className="pl-over"> · {formatCount(cell.overQuota)} {WORDS.overQuota.one}</span> : null}
            </span>
            {onToggle ? <CellToggleButton cell={cell} onToggle={onToggle} /> : null}
          </div>
        </li>
      ))}
    </ul>
  );
}
