import { useState } from 'react';
import { Dialog } from '../../../components/dialog';
import { formatCount, formatMoment } from '../../../lib/format';
import { blockingCells, type LocalCell } from '../../../sync/cell-status';
import { CellStatusTag, cellWord } from './cell-status-tag';

interface CellCheckStepProps {
  /** The respondent's cells with this device's unsent completes counted; empty if never synced. */
  cells: LocalCell[];
  syncedAt: string | null;
  onStart: () => void;
  onBack: () => void;
  /** Logs the contact as turned away because the cell is full (offered when one is full or closed). */
  onTurnAway: () => void;
  saving: boolean;
}

/** Step 3 of a complete, before the interview proper: are the respondent's cells still open? */
export function CellCheckStep({ cells, syncedAt, onStart, onBack, onTurnAway, saving }: CellCheckStepProps) {
  const [confirming, setConfirming] = useState(false);
  const blocking = blockingCells(cells);
  const nearlyFull = cells.some((cell) => cell.status === 'nearly_full');

  return (
    <section aria-labelledby="pl-check-title">
      <h2 id="pl-check-title" className="pl-step-title" tabIndex={-1}>
        Their cells
      </h2>
      {cells.length === 0 ? (
        <p className="pl-form-note">Cell status is not known yet: this device has not synced this project’s cells. You can still go ahead.</p>
      ) : blocking.length > 0 ? (
        <p className="pl-cell-warning" role="alert">
          {blocking.length === 1 ? 'One of their cells is' : 'Some of their cells are'} full or closed. You may still
          interview; it will count as over quota.
        </p>
      ) : (
        <p className="pl-cell-fine" role="status">
          {nearlyFull ? 'Their cells are open, some nearly full.' : 'All their cells are open.'}
        </p>
      )}
      <ul className="pl-cell-rows" aria-label="The respondent’s cells">
        {cells.map((cell) => (
          <li key={cell.id} className="pl-cell-row">
            <span className="pl-cell-label">{cellWord(cell.label)}</span>
            <CellStatusTag status={cell.status} />
            <span className="pl-cell-left pl-muted pl-small">
              <span className="pl-figure">{formatCount(cell.remaining)}</span> of{' '}
              <span className="pl-figure">{formatCount(cell.target)}</span> left
            </span>
          </li>
        ))}
      </ul>
      {syncedAt ? (
        <p className="pl-muted pl-small">From the sync of {formatMoment(syncedAt)}, with this device’s unsent completes counted.</p>
      ) : null}
      <div className="pl-step-actions">
        <button
          type="button"
          className="pl-button pl-button-main pl-button-wide"
          onClick={() => (blocking.length > 0 ? setConfirming(true) : onStart())}
        >
          Start the interview
        </button>
        {blocking.length > 0 ? (
          <button type="button" className="pl-button pl-button-quiet pl-button-wide" disabled={saving} onClick={onTurnAway}>
            Turn away: cell full
          </button>
        ) : null}
        <button type="button" className="pl-button pl-button-quiet pl-button-wide" onClick={onBack}>
          Change their categories
        </button>
      </div>
      {confirming ? (
        <Dialog
          title={blocking.some((cell) => cell.status === 'closed') ? 'Their cell is closed' : 'Their cell is full'}
          placement="sheet"
          onClose={() => setConfirming(false)}
        >
          <p className="pl-dialog-warning">
            {blocking.map((cell) => `${cellWord(cell.label)} is ${cell.status === 'closed' ? 'closed' : 'full'}`).join('; ')}.
          </p>
          <p>The interview will be accepted and counted as over quota, for your supervisor to decide.</p>
          <div className="pl-dialog-actions">
            <button type="button" className="pl-button pl-button-quiet" onClick={onStart}>
              Interview anyway
            </button>
            <button type="button" className="pl-button pl-button-main" onClick={() => setConfirming(false)} autoFocus>
              Go back
            </button>
          </div>
        </Dialog>
      ) : null}
    </section>
  );
}
