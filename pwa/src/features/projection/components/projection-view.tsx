import './projection.css';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useOnline } from '../../../hooks/use-online';
import { formatCalendarDate, formatClock, formatCount } from '../../../lib/format';
import { useProjection, type Projection } from '../api/get-projection';
import { ProjectionCaution } from './projection-caution';
import { ProjectionCells } from './projection-cells';
import { formatChance, formatPace, projectionSentence } from './projection-words';

/** One project's projection to the field end. The same figures for the lead and, read-only, for clients. */
export function ProjectionView({ projectId }: { projectId: string }) {
  const projection = useProjection(projectId);
  return (
    <QueryView
      query={projection}
      what="the projection"
      offlineNote="The projection needs the network. It will load as soon as you are back online."
      isEmpty={() => false}
      empty={null}
    >
      {(data) => <ProjectionContent projection={data} checkedAt={projection.dataUpdatedAt} />}
    </QueryView>
  );
}

function ProjectionContent({ projection: p, checkedAt }: { projection: Projection; checkedAt: number }) {
  const online = useOnline();
  const checked = formatClock(new Date(checkedAt).toISOString());
  const sentence = projectionSentence(p);
  const level = `${Math.round(p.level * 100)}%`;
  return (
    <>
      <p className="pl-small pl-muted" role="status">
        {online ? `Updated ${checked}` : `Offline: as of ${checked}`}
      </p>
      {p.problem ? (
        <div className="pl-form-note" role="note" aria-label="Projection incomplete">
          {p.problem}
        </div>
      ) : null}
      {sentence ? <p className="pl-projection-sentence">{sentence}</p> : null}
      {p.pacePerDay === null ? null : (
        <>
          <dl className="pl-projection-figures" aria-label="Projection figures">
            <div>
              <dt>Completes now</dt>
              <dd className="pl-figure">
                {formatCount(p.completes)} <small>of {formatCount(p.target)}</small>
              </dd>
            </div>
            <div>
              <dt>Pace per field day</dt>
              <dd className="pl-figure">
                {formatPace(p.pacePerDay)}
                <small>
                  {formatCalendarDate(p.windowFrom)} to {formatCalendarDate(p.windowTo)}
                </small>
              </dd>
            </div>
            <div>
              <dt>At the field end ({level} range)</dt>
              <dd className="pl-figure">
                {p.atEnd ? formatCount(Math.round(p.atEnd.expected)) : '—'}
                {p.atEnd ? <small>{`${formatCount(p.atEnd.lower)} to ${formatCount(p.atEnd.upper)}`}</small> : null}
              </dd>
            </div>
            <div>
              <dt>Target reached ({level} range)</dt>
              <dd className="pl-figure">
                {p.targetReached ? 'Reached' : p.targetDate ? formatCalendarDate(p.targetDate.expected) : 'Not at this pace'}
                {!p.targetReached && p.targetDate ? (
                  <small>{`${formatCalendarDate(p.targetDate.earliest)} to ${formatCalendarDate(p.targetDate.latest)}`}</small>
                ) : null}
              </dd>
            </div>
          </dl>
          {p.probabilityBelowTarget !== null && !p.targetReached ? (
            <p>Chance of ending below the target: {formatChance(p.probabilityBelowTarget)}.</p>
          ) : null}
          <section className="pl-section" aria-labelledby="pl-projection-cells-heading">
            <h2 id="pl-projection-cells-heading" className="pl-section-title">Cells at the field end</h2>
            {p.cells.length === 0 ? (
              <EmptyPanel title="No quota cells yet">
                <p>The cells appear once the project has quota targets.</p>
              </EmptyPanel>
            ) : (
              <ProjectionCells cells={p.cells} level={p.level} />
            )}
          </section>
        </>
      )}
      <ProjectionCaution />
    </>
  );
}
