import { formatCount, formatMoment } from '../../../lib/format';
import { dispositionWord } from '../../../lib/fieldwork-words';
import { useFlaggedInterviews } from '../api/get-flagged-interviews';
import { ScrollBox } from '../../../components/scroll-box';

/**
 * The quota board's count of interviews kept but flagged on arrival, by reason. A section of
 * its own with its own request, so a failure here never hides the cells.
 */
export function FlaggedInterviewsSection({ projectId }: { projectId: string }) {
  const flagged = useFlaggedInterviews(projectId);
  const data = flagged.data;
  return (
    <section className="pl-section" aria-labelledby="pl-flagged-heading">
      <h2 id="pl-flagged-heading" className="pl-section-title">
        Flagged interviews
      </h2>
      {data === undefined ? (
        <p className="pl-muted">{flagged.isError ? 'The flagged interviews could not be loaded; the board will try again.' : 'Loading…'}</p>
      ) : data.total === 0 ? (
        <p className="pl-muted">No interviews are flagged.</p>
      ) : (
        <>
          <p className="pl-small pl-muted">
            Kept, but worth a look: <span className="pl-figure">{formatCount(data.total)}</span>{' '}
            {data.total === 1 ? 'interview' : 'interviews'} in all.
          </p>
          <ScrollBox label="Flagged interviews, scrolls sideways">
            <table className="pl-table" aria-label="Flagged interviews">
              <thead>
                <tr>
                  <th scope="col">Flag</th>
                  <th scope="col" className="is-numeric">Interviews</th>
                </tr>
              </thead>
              <tbody>
                {data.byReason.map((row) => (
                  <tr key={row.code}>
                    <th scope="row">{row.reason}</th>
                    <td className="is-numeric pl-figure">{formatCount(row.count)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollBox>
          {data.voided.length ? (
            <>
              <h3 className="pl-variable-name">Voided, with the reason given</h3>
              <ul className="pl-entry-list" aria-label="Voided interviews">
                {data.voided.map((v) => (
                  <li key={v.id} className="pl-entry">
                    <span className="pl-entry-time pl-figure">{formatMoment(v.voidedAt)}</span>
                    <span className="pl-entry-what">
                      {dispositionWord(v.disposition)} by {v.interviewer}, {v.fieldDay}
                      {v.voidedBy === v.interviewer ? '' : `; voided by ${v.voidedBy}`}
                    </span>
                    <span className="pl-entry-reason">Reason: {v.reason}</span>
                  </li>
                ))}
              </ul>
            </>
          ) : null}
        </>
      )}
    </section>
  );
}
