import { ConfirmDialog } from '../../../components/confirm-dialog';
import { ScrollBox } from '../../../components/scroll-box';
import { formatCount } from '../../../lib/format';
import type { CellResponse } from '../../../lib/api-types';

interface CellPreviewDialogProps {
  /** The cells the new targets give. */
  cells: CellResponse[];
  /** The cells as saved now (empty before the first save). */
  current: CellResponse[];
  sampleSize: number;
  busy: boolean;
  problem?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

const keyOf = (cell: Pick<CellResponse, 'categoryIds'>) => cell.categoryIds.join(' ');

/** Every cell target the new targets give, beside today's, before anything is saved. */
export function CellPreviewDialog({ cells, current, sampleSize, busy, problem, onConfirm, onCancel }: CellPreviewDialogProps) {
  const now = new Map(current.map((c) => [keyOf(c), c.target]));
  const changed = cells.filter((c) => now.get(keyOf(c)) !== c.target).length;
  const overfull = cells.filter((c) => c.achieved > c.target).length;
  return (
    <ConfirmDialog title="Check the cell targets" confirmLabel={busy ? 'Saving…' : 'Save these targets'} cancelLabel="Go back" onConfirm={onConfirm} onCancel={onCancel} busy={busy} problem={problem}>
      <p>
        {formatCount(cells.length)} cells sharing a sample of {formatCount(sampleSize)}
        {current.length > 0 ? `; ${changed === 0 ? 'no target changes' : `${formatCount(changed)} ${changed === 1 ? 'target changes' : 'targets change'}`}` : ''}.
        {overfull > 0 ? ` ${overfull === 1 ? '1 cell already holds more interviews than its new target' : `${formatCount(overfull)} cells already hold more interviews than their new targets`}.` : ''}
      </p>
      <ScrollBox label="New cell targets, scrolls sideways">
        <table className="pl-table" aria-label="New cell targets">
          <thead>
            <tr>
              <th scope="col">Cell</th>
              {current.length > 0 ? (
                <th scope="col" className="is-numeric">
                  Now
                </th>
              ) : null}
              <th scope="col" className="is-numeric">
                New target
              </th>
              <th scope="col" className="is-numeric">
                Achieved
              </th>
            </tr>
          </thead>
          <tbody>
            {cells.map((cell) => {
              const before = now.get(keyOf(cell));
              return (
                <tr key={keyOf(cell)} className={before !== undefined && before !== cell.target ? 'is-changed' : undefined}>
                  <th scope="row">{cell.label}</th>
                  {current.length > 0 ? <td className="is-numeric pl-figure">{before === undefined ? 'new' : formatCount(before)}</td> : null}
                  <td className="is-numeric pl-figure">{formatCount(cell.target)}</td>
                  <td className="is-numeric pl-figure">{formatCount(cell.achieved)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollBox>
    </ConfirmDialog>
  );
}
