import { Dialog } from '../../../components/dialog';

interface RemoveVariableDialogProps {
  name: string;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks before a quota variable is taken out of a project that is already in the field. */
export function RemoveVariableDialog({ name, onConfirm, onCancel }: RemoveVariableDialogProps) {
  return (
    <Dialog title={`Remove ${name}?`} onClose={onCancel} placement="sheet">
      <p>
        Fieldwork has started. Once you save, {name} stops being a quota and is left out of weighting; every interview
        already logged is kept, with its category. Nothing changes until you save the targets.
      </p>
      <div className="pl-dialog-actions">
        <button type="button" className="pl-button pl-button-quiet" onClick={onConfirm}>
          Remove {name}
        </button>
        <button type="button" className="pl-button pl-button-main" onClick={onCancel} autoFocus>
          Keep it
        </button>
      </div>
    </Dialog>
  );
}
