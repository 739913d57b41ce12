import { Dialog } from '../../../components/dialog';
import { formatDecimal } from '../../../lib/format';

interface ScaleSharesDialogProps {
  totals: { name: string; total: number }[];
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks before shares that do not add up to 100% are saved scaled to 100%. */
export function ScaleSharesDialog({ totals, onConfirm, onCancel }: ScaleSharesDialogProps) {
  return (
    <Dialog title="Shares do not add up to 100%" onClose={onCancel} placement="sheet">
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
      <div className="pl-dialog-actions">
        <button type="button" className="pl-button pl-button-quiet" onClick={onConfirm}>
          Save scaled to 100%
        </button>
        <button type="button" className="pl-button pl-button-main" onClick={onCancel} autoFocus>
          Go back
        </button>
      </div>
    </Dialog>
  );
}
