import './next-interviews.css';
import { formatCount } from '../../../lib/format';
import { useNextInterviews, type NextInterviews } from '../api/get-next-interviews';

/** A cell as a supervisor says it: "Age band: 65+ × Sex: female" → "65+ · female"; "Education: basic" stays. */
export function cellWords(label: string): string {
  const parts = label.split(' × ');
  return parts.length === 1 ? label : parts.map((part) => part.split(': ').at(-1)).join(' · ');
}

/** "18 in 60+ · female, 12 in North, 9 in South and 11 in 3 more cells": the plan in one sentence. */
export function planSentence(plan: NextInterviews['plan'], named = 3): string {
  const first = plan.slice(0, named).map((p) => `${formatCount(p.interviews)} in ${cellWords(p.label)}`);
  const rest = plan.slice(named);
  if (rest.length === 0) return first.length > 1 ? `${first.slice(0, -1).join(', ')} and ${first.at(-1)}` : (first[0] ?? '');
  const more = rest.reduce((s, p) => s + p.interviews, 0);
  return `${first.join(', ')} and ${formatCount(more)} in ${rest.length === 1 ? '1 more cell' : `${formatCount(rest.length)} more cells`}`;
}

/**
 * Where the next interviews raise the effective sample size most, and the cells where more
 * interviews now cost precision. Its own section with its own request, so a failure here
 * never hides the cells (docs/methods.md, "Where the next interviews help most").
 */
export function NextInterviewsSection({ projectId }: { projectId: string }) {
  const next = useNextInterviews(projectId);
  const data = next.data;
  return (
    <section className="pl-section pl-next" aria-labelledby="pl-next-heading">
      <h2 id="pl-next-heading" className="pl-section-title">
        Where the next interviews help most
      </h2>
      {data === undefined ? (
        <p className="pl-muted">{next.isError ? 'The plan could not be loaded; the board will try again.' : 'Loading…'}</p>
      ) : data.problem !== null ? (
        <p className="pl-form-note" role="note">{data.problem}</p>
      ) : (
        <NextPlan data={data} />
      )}
    </section>
  );
}

function NextPlan({ data }: { data: NextInterviews }) {
  const before = Math.round(data.effectiveSampleSize ?? 0);
  const after = Math.round(data.effectiveSampleSizeAfter ?? 0);
  return (
    <>
      {data.planned === 0 ? (
        <p className="pl-muted">Every open cell is full: no interviews are wanted anywhere.</p>
      ) : (
        <>
          <p className="pl-next-sentence">
            <strong>Next {formatCount(data.planned)}:</strong> {planSentence(data.plan)}.
          </p>
          <ol className="pl-next-list" aria-label={`The next ${data.planned} interviews, by cell`}>
            {data.plan.map((p) => (
              <li key={p.id}>
                <span className="pl-figure pl-next-count">{formatCount(p.interviews)}</span>
                <span>in {cellWords(p.label)}</span>
              </li>
            ))}
          </ol>
          <p className="pl-small pl-muted">
            Done this way, the weighted sample counts as <span className="pl-figure">{formatCount(after)}</span> interviews
            instead of <span className="pl-figure">{formatCount(before)}</span> now (effective sample size).
            {data.planned < data.count ? ` The open cells have room for only ${formatCount(data.planned)} more.` : ''}
          </p>
        </>
      )}
      {data.costly.length > 0 ? (
        <div className="pl-next-costly">
          <h3 className="pl-next-subtitle">Hold back here: more interviews now cost precision</h3>
          <ul aria-label="Hold back: more interviews here cost precision">
            {data.costly.map((c) => (
              <li key={c.id}>
                <span>{cellWords(c.label)}</span>{' '}
                <span className="pl-figure pl-small">
                  {formatCount(c.achieved)} of {formatCount(c.target)}
                  {c.achieved > c.target ? `, ${formatCount(c.achieved - c.target)} over target` : ', full'}
                </span>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </>
  );
}
