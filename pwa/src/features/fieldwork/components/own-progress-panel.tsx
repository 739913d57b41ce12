import './own-progress.css';
import type { FieldProject, OutboxEntry } from '../../../db/plumbline-db';
import { formatCount } from '../../../lib/format';
import type { ProjectCellStatus } from '../hooks/use-field-status';
import { ownProgress } from '../own-progress';
import { CellStatusTag, cellWord } from './cell-status-tag';

interface OwnProgressPanelProps {
  project: FieldProject;
  status: ProjectCellStatus | undefined;
  entries: OutboxEntry[];
}

/** "Your work" on a project card: completes against the assignment, today's figures, the assigned cells. */
export function OwnProgressPanel({ project, status, entries }: OwnProgressPanelProps) {
  const progress = ownProgress(project, status?.cells, entries);
  const headingId = `pl-own-${project.id}`;
  return (
    <section className="pl-own-progress" aria-labelledby={headingId}>
      <h3 id={headingId} className="pl-own-title">
        Your work
      </h3>
      {progress.target !== null ? (
        <>
          <p className="pl-own-main">
            <span className="pl-figure">{formatCount(progress.completes)}</span> of <span className="pl-figure">{formatCount(progress.target)}</span> completes
            {progress.completes >= progress.target ? ': target reached' : `, ${formatCount(progress.target - progress.completes)} to go`}
          </p>
          <progress className="pl-own-bar" max={progress.target} value={Math.min(progress.completes, progress.target)} aria-label={`Your completes on ${project.name}`} />
        </>
      ) : (
        <p className="pl-own-main">
          <span className="pl-figure">{formatCount(progress.completes)}</span> completes so far (no target of your own)
        </p>
      )}
      <p className="pl-small">
        Today: <span className="pl-figure">{formatCount(progress.todayContacts)}</span> {progress.todayContacts === 1 ? 'contact' : 'contacts'},{' '}
        <span className="pl-figure">{formatCount(progress.todayCompletes)}</span> {progress.todayCompletes === 1 ? 'complete' : 'completes'}
      </p>
      {progress.cells.length > 0 ? (
        <ul className="pl-cell-rows" aria-label={`Your cells on ${project.name}`}>
          {progress.cells.map((cell) => (
            <li key={cell.id} className="pl-cell-row">
              <span className="pl-cell-label">{cellWord(cell.label)}</span>
              <CellStatusTag status={cell.status} />
              <span className="pl-cell-left pl-muted pl-small">
                <span className="pl-figure">{formatCount(cell.remaining)}</span> of <span className="pl-figure">{formatCount(cell.target)}</span> left
              </span>
            </li>
          ))}
        </ul>
      ) : null}
      {progress.unknownCells > 0 ? (
        <p className="pl-muted pl-small">
          {progress.unknownCells === 1 ? 'One of your cells is' : `${progress.unknownCells} of your cells are`} not on this device yet; they appear after the next sync.
        </p>
      ) : null}
    </section>
  );
}
