import { useId, useState } from 'react';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import type { Decision } from '../api/decide';

export const REASON_MAX = 500;

export const actionWords: Record<Decision['action'], { verb: string; done: string }> = {
  approve: { verb: 'Approve', done: 'Approved' },
  reject: { verb: 'Reject', done: 'Rejected' },
  reinstate: { verb: 'Reinstate', done: 'Reinstated' },
};

interface DecisionDialogProps {
  action: Decision['action'];
  /** What the decision applies to, in words ("3 interviews", "all of Ada Quill's on 20 Nov 2026"). */
  what: string;
  busy: boolean;
  problem: string | null;
  onConfirm: (reason: string) => void;
  onCancel: () => void;
}

/** Asks for the reason every decision needs; it is kept in the audit trail with who and when. */
export function DecisionDialog({ action, what, busy, problem, onConfirm, onCancel }: DecisionDialogProps) {
  const [reason, setReason] = useState('');
  const [missing, setMissing] = useState(false);
  const fieldId = useId();
  const problemId = useId();
  const words = actionWords[action];
  const confirm = () => {
    if (!reason.trim()) setMissing(true);
    else onConfirm(reason.trim());
  };
  return (
    <ConfirmDialog
      title={`${words.verb} ${what}?`}
      confirmLabel={words.verb}
      onConfirm={confirm}
      onCancel={onCancel}
      busy={busy}
      problem={missing ? 'Give a reason: it is kept in the audit trail with your name.' : problem}
      problemId={problemId}
    >
      <p className="pl-small">
        {action === 'reject'
          ? 'Rejected interviews stop counting at once: they leave the cells, the balance and the export.'
          : action === 'reinstate'
            ? 'Reinstated interviews count again and wait for review.'
            : 'Approved interviews count and stop showing their flags.'}
      </p>
      <div className="pl-field">
        <label htmlFor={fieldId}>Reason (required)</label>
        <textarea
          id={fieldId}
          className="pl-input pl-review-reason"
          value={reason}
          maxLength={REASON_MAX}
          rows={3}
          autoFocus
          aria-describedby={missing || problem ? problemId : undefined}
          onChange={(event) => {
            setReason(event.target.value);
            setMissing(false);
          }}
        />
      </div>
    </ConfirmDialog>
  );
}
