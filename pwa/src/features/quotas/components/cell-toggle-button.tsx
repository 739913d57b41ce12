import type { Cell } from '../api/get-quota-board';

/** Close an open cell or reopen a closed one (asks for confirmation through `onToggle`). */
export function CellToggleButton({ cell, onToggle }: { cell: Cell; onToggle: (cell: Cell) => void }) {
  const verb = cell.status === 'closed' ? 'Reopen' : 'Close';
  return (
    <button
      type="button"
      className="pl-button pl-button-quiet pl-button-small"
      aria-label={`${verb} cell ${cell.label}`}
      onClick={() => onToggle(cell)}
    >
      {verb}
    </button>
  );
}
