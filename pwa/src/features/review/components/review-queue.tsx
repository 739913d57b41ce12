import { useState } from 'react';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { FormProblem } from '../../../components/form-problem';
import { formatCalendarDate } from '../../../lib/format';
import { useDecide, type Decision } from '../api/decide';
import { downloadDecisions } from '../api/download-decisions';
import { useReviewOptions } from '../api/get-review-options';
import { useReviewQueue, type ReviewFilters } from '../api/get-review-queue';
import { actionWords, DecisionDialog } from './decision-dialog';
import { ReviewCard } from './review-card';
import { ReviewFiltersBar } from './review-filters';
import './review.css';

type Pending = { action: Decision['action']; what: string; target: Pick<Decision, 'interviewIds' | 'selection'> };

/** The review queue of one project: filters, the interviews flagged first, decisions with a reason. */
export function ReviewQueue({ projectId, projectName }: { projectId: string; projectName: string }) {
  const [filters, setFilters] = useState<ReviewFilters>({});
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const [pending, setPending] = useState<Pending | null>(null);
  const [done, setDone] = useState('');
  const [exportProblem, setExportProblem] = useState<string | null>(null);
  const queue = useReviewQueue(projectId, filters);
  const options = useReviewOptions(projectId);
  const decideMutation = useDecide(projectId);
  const items = queue.data?.pages.flatMap((p) => p.items) ?? [];

  const choose = (next: ReviewFilters) => {
    setFilters(next);
    setSelected(new Set());
  };
  const confirm = (reason: string) => {
    if (!pending) return;
    decideMutation.mutate({ action: pending.action, reason, ...pending.target }, {
      onSuccess: (result) => {
        setDone(`${actionWords[result.action].done} ${result.decided} ${result.decided === 1 ? 'interview' : 'interviews'}.`);
        setPending(null);
        setSelected(new Set());
      },
    });
  };
  const open = (next: Pending) => {
    decideMutation.reset();
    setPending(next);
  };
  const exportTrail = () => {
    setExportProblem(null);
    downloadDecisions(projectId, projectName).catch((error: Error) => setExportProblem(`The decisions could not be exported: ${error.message}`));
  };

  return (
    <>
      <ReviewFiltersBar filters={filters} options={options.data} onChange={choose} />
      <p className="pl-visually-hidden" role="status">{done}</p>
      {done ? <p className="pl-small pl-review-done" aria-hidden="true">{done}</p> : null}
      <QueryView
        query={queue}
        what="the review queue"
        offlineNote="The review queue needs the network. It will load as soon as you are back online."
        isEmpty={(data) => data.pages[0]!.items.length === 0}
        empty={<EmptyPanel title="Nothing to review"><p>No interviews match these filters.</p></EmptyPanel>}
      >
        {() => (
          <>
            <p className="pl-small pl-muted">
              Flagged interviews come first, then the rest; each newest first.
            </p>
            <div className="pl-review-actions" aria-label="Decide on the selected interviews" role="group">
              <span className="pl-small">{selected.size} selected</span>
              {(['approve', 'reject', 'reinstate'] as const).map((action) => (
                <button key={action} type="button" className="pl-button pl-button-small" disabled={selected.size === 0}
                  onClick={() => open({ action, what: `${selected.size} ${selected.size === 1 ? 'interview' : 'interviews'}`, target: { interviewIds: [...selected] } })}>
                  {actionWords[action].verb}
                </button>
              ))}
            </div>
            <ul className="pl-card-list" aria-label="Interviews to review">
              {items.map((item) => (
                <ReviewCard key={item.id} projectId={projectId} item={item} selected={selected.has(item.id)}
                  onSelect={(on) => setSelected((s) => { const next = new Set(s); if (on) next.add(item.id); else next.delete(item.id); return next; })}
                  onDecideDay={(action) => open({ action, what: `all of ${item.interviewer.name}'s interviews on ${formatCalendarDate(item.fieldDay)}`, target: { selection: { interviewerId: item.interviewer.id, fieldDay: item.fieldDay } } })} />
              ))}
            </ul>
            {queue.hasNextPage ? (
              <button type="button" className="pl-button pl-button-quiet" disabled={queue.isFetchingNextPage} onClick={() => void queue.fetchNextPage()}>
                {queue.isFetchingNextPage ? 'Loading…' : 'Show more'}
              </button>
            ) : null}
          </>
        )}
      </QueryView>
      <p>
        <button type="button" className="pl-button pl-button-quiet" onClick={exportTrail}>Export decisions (CSV)</button>
      </p>
      <FormProblem message={exportProblem} />
      {pending ? (
        <DecisionDialog action={pending.action} what={pending.what} busy={decideMutation.isPending}
          problem={decideMutation.error ? decideMutation.error.message : null} onConfirm={confirm} onCancel={() => setPending(null)} />
      ) : null}
    </>
  );
}
