import { useState } from 'react';
import { formatCalendarDate, formatDate, formatPercent } from '../../../lib/format';
import { headlineAnswerWords } from '../../../lib/fieldwork-words';
import type { Backcheck } from '../api/get-backchecks';
import { useRecordOutcome } from '../api/record-outcome';
import { OutcomeForm } from './outcome-form';
import { outcomeWords } from './outcome-words';

function reference(check: Backcheck): string {
  if (check.respondentReference) return check.respondentReference;
  if (check.referenceDeletedAt) return `deleted on ${formatDate(check.referenceDeletedAt)}`;
  return 'none given';
}

/** One selected interview: what to ask about on the call-back, and what was found. */
export function BackcheckCard({ projectId, check }: { projectId: string; check: Backcheck }) {
  const [editing, setEditing] = useState(false);
  const record = useRecordOutcome(projectId);
  const open = check.outcome === null || check.outcome === 'not_reached';
  return (
    <li className={`pl-card pl-backcheck${check.outcome ? ` is-${check.outcome}` : ''}`} aria-label={`Back-check of ${check.interviewerName}, ${formatCalendarDate(check.fieldDay)}`}>
      <div className="pl-card-head">
        <h3 className="pl-card-title">{check.interviewerName}</h3>
        <span className="pl-tag">{check.outcome ? outcomeWords[check.outcome] : 'Pending'}</span>
      </div>
      <dl className="pl-backcheck-facts">
        <dt>Field day</dt>
        <dd>{formatCalendarDate(check.fieldDay)}</dd>
        <dt>Categories</dt>
        <dd>{check.categories.map((c) => `${c.variable}: ${c.category}`).join(', ') || 'none'}</dd>
        <dt>Headline answer</dt>
        <dd>{check.headlineAnswer ? headlineAnswerWords[check.headlineAnswer] : 'none'}</dd>
        <dt>Reference</dt>
        <dd>{reference(check)}</dd>
        <dt>Selected at a share of</dt>
        <dd>{formatPercent(check.shareAtSelection, 0)}</dd>
      </dl>
      {check.outcome ? (
        <p className="pl-card-text">
          {outcomeWords[check.outcome]}, recorded by {check.recordedByName} on {formatDate(check.recordedAt)}
          {check.outcomeNote ? `: ${check.outcomeNote}` : '.'}
        </p>
      ) : null}
      {open && editing ? (
        <OutcomeForm
          busy={record.isPending}
          problem={record.error?.message}
          onCancel={() => setEditing(false)}
          onSave={(value) => record.mutate({ interviewId: check.interviewId, ...value }, { onSuccess: () => setEditing(false) })}
        />
      ) : null}
      {open && !editing ? (
        <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={() => setEditing(true)}>
          {check.outcome ? 'Record another outcome' : 'Record the outcome'}
        </button>
      ) : null}
    </li>
  );
}
