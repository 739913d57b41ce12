// What opens under one interviewer: the outcome mix, each flag with its figures, the
// back-check results and the same rates per field day.
import { ScrollBox } from '../../../components/scroll-box';
import { dispositionOrder, dispositionWords } from '../../../lib/fieldwork-words';
import { formatCalendarDate, formatCount, formatPercent } from '../../../lib/format';
import type { InterviewerRates } from '../api/get-interviewer-rates';
import { formatDuration, formatP } from './rates-view';

const outcomes = [...dispositionOrder, 'quota_full' as const];

const ruleWords: Record<string, string> = {
  too_short: 'Too short',
  overlapping: 'Overlapping',
  out_of_hours: 'Out of hours',
  burst: 'Too many in an hour',
};

export function OutcomeMix({ row }: { row: Pick<InterviewerRates, 'outcomes'> }) {
  const shown = outcomes.filter((d) => row.outcomes[d] > 0);
  if (shown.length === 0) return <p className="pl-muted">No contacts yet.</p>;
  return <p className="pl-small">{shown.map((d) => `${dispositionWords[d]} ${formatCount(row.outcomes[d])}`).join(' · ')}</p>;
}

export function InterviewerDetails({ row }: { row: InterviewerRates }) {
  const { test, backchecks: checks } = row;
  return (
    <div className="pl-rates-details">
      <h4>Outcomes</h4>
      <OutcomeMix row={row} />
      <h4>Flags</h4>
      {row.findings.length === 0 && !test?.flagged ? <p className="pl-small">No flags on interviews awaiting a decision.</p> : null}
      <ul className="pl-small">
        {row.findings.map((f) => (
          <li key={f.rule}>
            {ruleWords[f.rule] ?? f.rule}: {formatCount(f.count)}
          </li>
        ))}
      </ul>
      <p className="pl-small">
        {test
          ? `Headline answers against the rest of the sample (${formatCount(test.completes)} completes): p ${formatP(test.pValue)}, adjusted p ${formatP(test.adjustedPValue)}${test.flagged ? ', flagged' : ''}. ${test.reason}`
          : 'Headline answers not tested yet.'}
      </p>
      <h4>Back-checks</h4>
      <p className="pl-small">
        {checks.selected === 0
          ? 'None selected yet.'
          : `${formatCount(checks.selected)} selected: ${formatCount(checks.confirmed)} confirmed, ${formatCount(checks.notConfirmed)} not confirmed, ${formatCount(checks.notReached)} could not be reached, ${formatCount(checks.pending)} to do.`}
      </p>
      <h4>By field day</h4>
      <ScrollBox label={`Field days of ${row.name}, scrolls sideways`}>
        <table className="pl-table" aria-label={`Field days of ${row.name}`}>
          <thead>
            <tr>
              <th scope="col">Day</th>
              <th scope="col" className="is-numeric">Contacts</th>
              <th scope="col" className="is-numeric">Completes</th>
              <th scope="col" className="is-numeric">COOP1</th>
              <th scope="col" className="is-numeric">REF2</th>
              <th scope="col" className="is-numeric">CON2</th>
              <th scope="col" className="is-numeric">Median length</th>
            </tr>
          </thead>
          <tbody>
            {row.days.map((day) => (
              <tr key={day.fieldDay}>
                <th scope="row">{formatCalendarDate(day.fieldDay)}</th>
                <td className="is-numeric pl-figure">{formatCount(day.contacts)}</td>
                <td className="is-numeric pl-figure">{formatCount(day.completes)}</td>
                <td className="is-numeric pl-figure">{formatPercent(day.rates.COOP1)}</td>
                <td className="is-numeric pl-figure">{formatPercent(day.rates.REF2)}</td>
                <td className="is-numeric pl-figure">{formatPercent(day.rates.CON2)}</td>
                <td className="is-numeric pl-figure">{formatDuration(day.medianDurationSeconds)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
    </div>
  );
}
