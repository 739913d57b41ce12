import { Dialog } from '../../../components/dialog';
import { formatCount } from '../../../lib/format';
import type { Cell } from '../api/get-quota-board';
import { FormProblem } from '../../../components/form-problem';

interface CloseCellDialogProps {
  cell: Cell;
  busy: boolean;
  problem: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks before a cell is closed or reopened, and says what the interviewers will notice. */
export function CloseCellDialog({ cell, busy, problem, onConfirm, onCancel }: CloseCellDialogProps) {
  const closing = cell.status !== 'closed';
  return (
    <Dialog title={closing ? 'Close this cell?' : 'Reopen this cell?'} onClose={onCancel} placement="sheet">
      <p>
        <strong>{cell.label}</strong>: {formatCount(cell.achieved)} of {formatCount(cell.target)} achieved.
      </p>
      <p className="pl-dialog-warning">
        {closing
          ? 'Interviewers will see the cell as closed at their next sync and are warned before logging another interview in it. Interviews already logged are kept.'
          : 'Interviewers will see the cell open again at their next sync.'}
      </p>
      <FormProblem message={problem} />
      <div className="pl-dialog-actions">
        <button type="button" className="pl-button pl-button-quiet" onClick={onCancel}>
          Cancel
        </button>
        <button type="button" className="pl-button pl-button-main" onClick={onConfirm} disabled={busy}>
          {closing ? 'Close cell' : 'Reopen cell'}
        </button>
      </div>
    </Dialog>
  );
}
