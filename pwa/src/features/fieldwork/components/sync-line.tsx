import { Link } from 'react-router-dom';
import { formatCount, formatMoment } from '../../../lib/format';
import { useSyncProgress } from '../../../sync/sync-progress';
import { WORDS } from '../../../lib/glossary';

/** One line under the title: how much is waiting and when the office last got this device's work. */
export function SyncLine({ waiting, lastSync }: { waiting: number; lastSync: string | null }) {
  const progress = useSyncProgress();
  return (
    <p className="pl-sync-line" role="status">
      <Link to="/interviewer/outbox" className="pl-sync-link">
        <span className="pl-figure">{formatCount(waiting)}</span> {waiting === 1 ? WORDS.unsent.one : WORDS.unsent.many} in the {WORDS.outbox.one}
      </Link>
      <span className="pl-muted pl-small">
        {progress.running ? 'Syncing…' : `Last sync ${lastSync ? formatMoment(lastSync) : 'not yet on this device'}`}
      </span>
    </p>
  );
}
