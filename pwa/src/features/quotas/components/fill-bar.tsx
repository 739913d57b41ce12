import type { CellStatus } from '../api/get-quota-board';

/** How full a cell is, drawn as a level; the number beside it carries the meaning. */
export function FillBar({ fillRate, status }: { fillRate: number; status: CellStatus }) {
  const width = Math.max(0, Math.min(1, fillRate)) * 100;
  return (
    <span className={`pl-fill pl-fill-${status}`} aria-hidden="true">
      <span className="pl-fill-level" style={{ width: `${width}%` }} />
    </span>
  );
}
