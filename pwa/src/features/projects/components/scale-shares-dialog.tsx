import { ConfirmDialog } from '../../../components/confirm-dialog';
import { formatDecimal } from '../../../lib/format';

interface ScaleSharesDialogProps {
  totals: { name: string; total: number }[];
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks before shares that do not add up to 100% are saved scaled to 100%. */
export function ScaleSharesDialog({ totals, onConfirm, onCancel }: ScaleSharesDialogProps) {
  return (
    <ConfirmDialog
      title="Shares do not add up to 100%"
      confirmLabel="Save scaled to 100%"
      cancelLabel="Go back"
      main="cancel"
      onConfirm={onConfirm}
      onCancel={onCancel}
    >
      <ul>
        {totals.map(({ name, total }) => (
          <li key={name}>
            {name}: <span className="pl-figure">{formatDecimal(total, 2)}</span>
          </li>
        ))}
      </ul>
      <p>
        Saved as they are, each of these is scaled to 100%, keeping the proportions between its categories. That is right
        for census counts; for a typing slip, go back and correct it.
      </p>
    </ConfirmDialog>
  );
}
