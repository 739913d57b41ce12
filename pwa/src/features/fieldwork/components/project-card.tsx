import type { CellStatus, FieldProject, OutboxEntry } from '../../../db/plumbline-db';
import { cellStatusWords } from '../../../lib/fieldwork-words';
import { formatCalendarDate, formatCount, formatMoment } from '../../../lib/format';
import type { ProjectCellStatus } from '../hooks/use-field-status';
import { OwnProgressPanel } from './own-progress-panel';

interface ProjectCardProps {
  project: FieldProject;
  status: ProjectCellStatus | undefined;
  /** This interviewer's outbox, for their own unsent contacts. */
  entries: OutboxEntry[];
  onLog: () => void;
}

const order: CellStatus[] = ['open', 'nearly_full', 'full', 'closed'];

/** One assigned project on the Today page: the big action first, then its cells in brief. */
export function ProjectCard({ project, status, entries, onLog }: ProjectCardProps) {
  const counts = Object.fromEntries(order.map((s) => [s, 0])) as Record<CellStatus, number>;
  for (const cell of status?.cells ?? []) counts[cell.status] += 1;

  return (
    <li className="pl-card pl-project-card">
      <h2 className="pl-card-title">{project.name}</h2>
      <p className="pl-muted pl-small">
        In the field {formatCalendarDate(project.fieldStart)} – {formatCalendarDate(project.fieldEnd)}
      </p>
      <button type="button" className="pl-button pl-button-main pl-button-wide pl-log-button" onClick={onLog} aria-label={`Log a contact for ${project.name}`}>
        Log a contact
      </button>
      <OwnProgressPanel project={project} status={status} entries={entries} />
      {status ? (
        <>
          <ul className="pl-status-counts" aria-label={`Cells of ${project.name}`}>
            {order.map((s) => (
              <li key={s} className={`pl-status-count is-${s.replace('_', '-')}`}>
                <span className="pl-figure">{formatCount(counts[s])}</span> {cellStatusWords[s].toLowerCase()}
              </li>
            ))}
          </ul>
          <p className="pl-muted pl-small">Cells as of the sync {formatMoment(status.syncedAt)}, with your unsent completes counted.</p>
        </>
      ) : (
        <p className="pl-muted pl-small">Cell status appears after this device’s first sync.</p>
      )}
    </li>
  );
}
