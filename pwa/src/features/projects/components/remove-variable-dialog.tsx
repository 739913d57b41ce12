import { ConfirmDialog } from '../../../components/confirm-dialog';
import { WORDS } from '../../../lib/glossary';

interface RemoveVariableDialogProps {
  /** What is being removed: a quota variable, or one category of it. */
  what: 'variable' | 'category';
  name: string;
  /** Counted interviews logged in it so far. */
  interviews: number;
  onConfirm: () => void;
  onCancel: () => void;
}

const count = (n: number) => (n === 1 ? `1 ${WORDS.interview.one}` : `${n} ${WORDS.interview.many}`);

/**
 * Asks before a quota variable or category that holds interviews (or any, mid-field) is taken
 * out: once saved it is retired, its interviews kept for the record and closed for new ones.
 */
export function RemoveVariableDialog({ what, name, interviews, onConfirm, onCancel }: RemoveVariableDialogProps) {
  const held = interviews > 0 ? `${name} holds ${count(interviews)}.` : `No ${WORDS.interview.many} are logged in ${name} yet.`;
  const weighting =
    what === 'variable'
      ? `${name} stops being a quota and is left out of weighting.`
      : `On the balance page they are left out of weighting unless you merge ${name} into another category of its variable.`;
  return (
    <ConfirmDialog title={`Remove ${name}?`} confirmLabel={`Remove ${name}`} cancelLabel="Keep it" main="cancel" onConfirm={onConfirm} onCancel={onCancel}>
      <p>{held}</p>
      <p>
        Once you save, {name} is retired: interviews already logged in it are kept, and it is closed for new ones. {weighting} An
        interviewer whose phone still offers {name} does not lose that interview: it is accepted and flagged for review.
        Nothing changes until you save the targets.
      </p>
    </ConfirmDialog>
  );
}
