import type { CellStatus } from '../api/get-quota-board';
import { statusWords } from './board-view';

/** The cell's status in words, with a shape and tint of our own beside it (never colour alone). */
export function CellStatusTag({ status }: { status: CellStatus }) {
  return (
    <span className={`pl-cell-status pl-cell-${status}`}>
      <span className="pl-cell-status-mark" aria-hidden="true" />
      {statusWords[status]}
    </span>
  );
}
