// Cell status of the interviewer's projects from the last sync plus this device's unsent
// completes. Read from the device, so it is there offline.
import '../fieldwork.css';
import { PageFrame } from '../../../components/page-frame';
import { EmptyPanel, LoadingPanel } from '../../../components/state-panels';
import { formatMoment } from '../../../lib/format';
import { syncNow } from '../../../sync/sync-scheduler';
import { useSyncProgress } from '../../../sync/sync-progress';
import { useBackgroundSync } from '../../../sync/use-background-sync';
import { CellTable } from '../components/cell-table';
import { useFieldStatus } from '../hooks/use-field-status';
import { heading, WORDS } from '../../../lib/glossary';

export function CellsPage() {
  useBackgroundSync();
  const field = useFieldStatus();
  const progress = useSyncProgress();

  return (
    <PageFrame title="Cells" lead="Before you start, check that the respondent’s cells are still open.">
      {!field ? (
        <LoadingPanel what="cells" />
      ) : field.projects.length === 0 ? (
        <EmptyPanel title="No cells on this device yet">
          <p>The cells of your projects appear here after this device’s first sync with the network.</p>
        </EmptyPanel>
      ) : (
        <>
          {/* Fresh figures just before an interview; also a way into the page for the keyboard. */}
          <p className="pl-cells-sync">
            <button type="button" className="pl-button pl-button-quiet" onClick={() => void syncNow()}>
              {progress.running ? 'Syncing…' : 'Sync now for the latest cells'}
            </button>
          </p>
          {field.projects.map((project) => {
            const status = field.cells[project.id];
            return (
              <section key={project.id} className="pl-card pl-cells-card" aria-label={`Cells of ${project.name}`}>
                <h2 className="pl-card-title">{project.name}</h2>
                {status ? (
                  <>
                    <p className="pl-muted pl-small">
                      As of the sync {formatMoment(status.syncedAt)}, with your {WORDS.unsent.many} counted.
                    </p>
                    <CellTable title={heading(WORDS.interlocked.many)} cells={status.cells.filter((c) => c.kind === 'interlocked')} />
                    <CellTable title={heading(WORDS.margin.many)} cells={status.cells.filter((c) => c.kind === 'margin')} />
                  </>
                ) : (
                  <p className="pl-muted">Not synced on this device yet.</p>
                )}
              </section>
            );
          })}
        </>
      )}
    </PageFrame>
  );
}
