import { ConfirmDialog } from '../../../components/confirm-dialog';

interface RemoveVariableDialogProps {
  name: string;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks before a quota variable is taken out of a project that is already in the field. */
export function RemoveVariableDialog({ name, onConfirm, onCancel }: RemoveVariableDialogProps) {
  return (
    <ConfirmDialog title={`Remove ${name}?`} confirmLabel={`Remove ${name}`} cancelLabel="Keep it" main="cancel" onConfirm={onConfirm} onCancel={onCancel}>
      <p>
        Fieldwork has started. Once you save, {name} stops being a quota and is left out of weighting; every interview
        already logged is kept, with its category. Nothing changes until you save the targets.
      </p>
    </ConfirmDialog>
  );
}
