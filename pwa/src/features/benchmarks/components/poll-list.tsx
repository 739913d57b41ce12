import { useState } from 'react';
import { FormProblem } from '../../../components/form-problem';
import { formatCalendarDate, formatCount, formatPercent } from '../../../lib/format';
import type { BenchmarkPoll } from '../api/get-benchmarks';
import { useDeleteBenchmark } from '../api/save-benchmark';
import { biasWords } from './reconciliation-words';
import { PollForm } from './poll-form';

/** The recorded polls, one card each, with change and remove; a form to record another. */
export function PollList({ projectId, polls }: { projectId: string; polls: BenchmarkPoll[] }) {
  const [editing, setEditing] = useState<string | 'new' | null>(null);
  const remove = useDeleteBenchmark(projectId);
  const groups = [...new Set(polls.map((p) => p.methodGroup))];
  return (
    <>
      {polls.length === 0 ? <p className="pl-muted">No other polls recorded yet.</p> : null}
      <ul className="pl-benchmark-list">
        {polls.map((p) =>
          editing === p.id ? (
            <li key={p.id}><PollForm projectId={projectId} poll={p} groups={groups} onDone={() => setEditing(null)} /></li>
          ) : (
            <li key={p.id} className="pl-benchmark-poll">
              <h3>{p.source}</h3>
              <p>
                <strong>{formatPercent(p.share)}</strong> yes ({formatCount(p.yes)} of {formatCount(p.sampleSize)}),{' '}
                {formatCalendarDate(p.fieldStart)} to {formatCalendarDate(p.fieldEnd)}
              </p>
              <p className="pl-small pl-muted">{p.methodGroup}: {biasWords(p.groupBias, p.biasFactor)}</p>
              <div className="pl-form-actions">
                <button type="button" className="pl-button" onClick={() => setEditing(p.id)} aria-label={`Change ${p.source}`}>Change</button>
                <button type="button" className="pl-button" onClick={() => remove.mutate(p.id)} disabled={remove.isPending} aria-label={`Remove ${p.source}`}>Remove</button>
              </div>
            </li>
          ),
        )}
      </ul>
      <FormProblem message={remove.error?.message} />
      {editing === 'new' ? (
        <PollForm projectId={projectId} groups={groups} onDone={() => setEditing(null)} />
      ) : (
        <button type="button" className="pl-button pl-button-main" onClick={() => setEditing('new')}>Record another poll</button>
      )}
    </>
  );
}
