import { formatCount, formatMoment } from '../../../lib/format';
import { syncNow } from '../../../sync/sync-scheduler';
import { useSyncProgress } from '../../../sync/sync-progress';

interface SendPanelProps {
  waiting: number;
  lastSync: string | null;
}

/** Sync on demand, its progress while it runs, and the time the office last got everything. */
export function SendPanel({ waiting, lastSync }: SendPanelProps) {
  const progress = useSyncProgress();
  return (
    <div className="pl-send">
      <button
        type="button"
        className="pl-button pl-button-main pl-button-wide"
        disabled={progress.running}
        onClick={() => void syncNow()}
      >
        {waiting > 0 ? 'Send now' : 'Sync now'}
      </button>
      {progress.running ? (
        <div className="pl-send-progress" role="status">
          <span>
            {progress.total === 0
              ? 'Syncing…'
              : progress.sent < progress.total
                ? `Sending ${formatCount(progress.sent)} of ${formatCount(progress.total)}…`
                : `${progress.total === 1 ? 'Sent' : `All ${formatCount(progress.total)} sent`}. Refreshing cell status…`}
          </span>
          {progress.total > 0 ? <progress max={progress.total} value={progress.sent} aria-hidden="true" /> : null}
        </div>
      ) : null}
      <p className="pl-small">
        Last successful sync: <strong>{lastSync ? formatMoment(lastSync) : 'not yet on this device'}</strong>
      </p>
      {!progress.running && progress.problems.length > 0 ? (
        <div className="pl-form-problem" role="alert">
          {progress.problems.map((problem) => (
            <p key={problem}>{problem}</p>
          ))}
        </div>
      ) : null}
    </div>
  );
}
