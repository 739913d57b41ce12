import { formatMoment } from '../../../lib/format';
import { useInterviewTrail } from '../api/get-interview-trail';
import { statusWords } from './review-words';

/** One interview's review decisions, oldest first: what changed, who, when and why. */
export function InterviewTrail({ projectId, interviewId }: { projectId: string; interviewId: string }) {
  const trail = useInterviewTrail(projectId, interviewId);
  if (trail.data === undefined) return <p className="pl-small pl-muted">{trail.isError ? 'The decisions could not be loaded.' : 'Loading the decisions…'}</p>;
  if (trail.data.length === 0) return <p className="pl-small pl-muted">No decisions yet.</p>;
  return (
    <ol className="pl-review-trail" aria-label="Decisions on this interview">
      {trail.data.map((d) => (
        <li key={d.id}>
          <span className="pl-figure">{formatMoment(d.decidedAt)}</span> {d.decidedBy.name}: {statusWords[d.previousStatus]} → {statusWords[d.newStatus]}.{' '}
          <span className="pl-review-why">Reason: {d.reason}</span>
        </li>
      ))}
    </ol>
  );
}
