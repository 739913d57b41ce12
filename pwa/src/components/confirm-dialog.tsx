import type { ReactNode } from 'react';
import { Dialog } from './dialog';
import { FormProblem } from './form-problem';

interface ConfirmDialogProps {
  title: string;
  children: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  onConfirm: () => void;
  onCancel: () => void;
  busy?: boolean;
  problem?: string | null;
  /** Id of the problem line, for a field inside the dialog to point at (aria-describedby). */
  problemId?: string;
  /** 'confirm' when going ahead is the usual choice; 'cancel' when going ahead is the risky one. */
  main?: 'confirm' | 'cancel';
}

/** Asks before an action, says what it does, and offers going ahead or backing out. */
export function ConfirmDialog({ title, children, confirmLabel, cancelLabel = 'Cancel', onConfirm, onCancel, busy = false, problem, problemId, main = 'confirm' }: ConfirmDialogProps) {
  const style = (role: 'confirm' | 'cancel') => `pl-button ${main === role ? 'pl-button-main' : 'pl-button-quiet'}`;
  const cancel = (
    <button type="button" className={style('cancel')} onClick={onCancel} autoFocus={main === 'cancel'}>
      {cancelLabel}
    </button>
  );
  const confirm = (
    <button type="button" className={style('confirm')} onClick={onConfirm} disabled={busy}>
      {confirmLabel}
    </button>
  );
  return (
    <Dialog title={title} onClose={onCancel} placement="sheet">
      {children}
      <FormProblem message={problem} id={problemId} />
      {/* The main choice sits last, nearest the thumb. */}
      <div className="pl-dialog-actions">
        {main === 'confirm' ? (
          <>
            {cancel}
            {confirm}
          </>
        ) : (
          <>
            {confirm}
            {cancel}
          </>
        )}
      </div>
    </Dialog>
  );
}
