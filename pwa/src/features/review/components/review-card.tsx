import { useState } from 'react';
import { formatCalendarDate, formatClock } from '../../../lib/format';
import { dispositionWord, headlineAnswerOf, headlineAnswerWords } from '../../../lib/fieldwork-words';
import type { Decision } from '../api/decide';
import type { ReviewItem } from '../api/get-review-queue';
import { actionWords } from './decision-dialog';
import { InterviewTrail } from './interview-trail';
import { figureName, figureValue, minutes, statusWords } from './review-words';

interface ReviewCardProps {
  projectId: string;
  item: ReviewItem;
  selected: boolean;
  onSelect: (selected: boolean) => void;
  /** Decide on every interview of this interviewer on this day. */
  onDecideDay: (action: Decision['action']) => void;
}

/** One interview in the queue: who, when, its flags; opened, the reasons and figures, the cells and the trail. */
export function ReviewCard({ projectId, item, selected, onSelect, onDecideDay }: ReviewCardProps) {
  const when = `${formatCalendarDate(item.fieldDay)}, ${formatClock(item.startedAt)}`;
  const answer = headlineAnswerOf(item.headlineAnswer);
  // The trail is fetched when the details are first opened, not for every card of the page.
  const [opened, setOpened] = useState(false);
  return (
    <li className={`pl-card pl-review-card${item.flags.length ? ' is-flagged' : ''}`}>
      <div className="pl-card-head">
        <label className="pl-review-pick">
          <input type="checkbox" checked={selected} onChange={(event) => onSelect(event.target.checked)} />
          <span>
            <span className="pl-card-title">{item.interviewer.name}</span>
            <span className="pl-small pl-muted"> · {when}</span>
          </span>
        </label>
        <span className={`pl-tag pl-review-status is-${item.reviewStatus}`}>{statusWords[item.reviewStatus]}</span>
      </div>
      <p className="pl-card-text pl-small">
        {dispositionWord(item.disposition)}, {minutes(item.durationSeconds)}
        {answer ? `, answered ${headlineAnswerWords[answer]}` : ''}
      </p>
      {item.flags.length ? (
        <ul className="pl-review-flags" aria-label="Flags">
          {item.flags.map((f) => (
            <li key={f.code} className="pl-tag pl-review-flag">{f.label}</li>
          ))}
        </ul>
      ) : null}
      <details className="pl-review-details" onToggle={(event) => event.currentTarget.open && setOpened(true)}>
        <summary>Details, reasons and decisions</summary>
        {item.flags.map((f) => (
          <div key={f.code} className="pl-review-reason-block">
            <p className="pl-card-text"><strong>{f.label}:</strong> {f.reason}</p>
            {f.figures.length ? (
              <dl className="pl-review-figures">
                {f.figures.map((x) => (
                  <div key={x.name}>
                    <dt>{figureName(x.name)}</dt>
                    <dd className="pl-figure">{figureValue(x.value)}</dd>
                  </div>
                ))}
              </dl>
            ) : null}
          </div>
        ))}
        <p className="pl-card-text pl-small">Cells: {item.categories.map((c) => `${c.variable}: ${c.label}`).join(', ') || 'none'}</p>
        <h3 className="pl-review-subtitle">Decisions</h3>
        {opened ? <InterviewTrail projectId={projectId} interviewId={item.id} /> : null}
        <h3 className="pl-review-subtitle">All of {item.interviewer.name} on {formatCalendarDate(item.fieldDay)}</h3>
        <div className="pl-review-day-actions">
          {(['approve', 'reject', 'reinstate'] as const).map((action) => (
            <button key={action} type="button" className="pl-button pl-button-quiet pl-button-small" onClick={() => onDecideDay(action)}>
              {actionWords[action].verb} the day
            </button>
          ))}
        </div>
      </details>
    </li>
  );
}
