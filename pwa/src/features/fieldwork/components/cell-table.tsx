import { formatCount } from '../../../lib/format';
import type { LocalCell } from '../../../sync/cell-status';
import { CellStatusTag, cellWord } from './cell-status-tag';

/** One group of cells (crossed or margin) with status, achieved of target and what remains. */
export function CellTable({ title, cells }: { title: string; cells: LocalCell[] }) {
  if (cells.length === 0) return null;
  return (
    <section className="pl-cell-group" aria-label={title}>
      <h3 className="pl-cell-group-title">{title}</h3>
      <ul className="pl-cell-rows">
        {cells.map((cell) => (
          <li key={cell.id} className="pl-cell-row">
            <span className="pl-cell-label">{cellWord(cell.label)}</span>
            <CellStatusTag status={cell.status} />
            <span className="pl-cell-left pl-small">
              <span className="pl-figure">{formatCount(cell.remaining)}</span> left ·{' '}
              <span className="pl-figure">
                {formatCount(cell.achieved)}/{formatCount(cell.target)}
              </span>
              {cell.unsent > 0 ? <span className="pl-muted"> (incl. {formatCount(cell.unsent)} unsent)</span> : null}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
