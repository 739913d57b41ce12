import './interviewer-rates.css';
import { useState } from 'react';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useWideScreen } from '../../../hooks/use-wide-screen';
import { formatPercent } from '../../../lib/format';
import { useInterviewerRates, type ProjectRates } from '../api/get-interviewer-rates';
import { RatesCards } from './rates-cards';
import { RatesTable } from './rates-table';
import { sortedBy, sortRates, type RatesSort } from './rates-view';

export const QUOTA_CAUTION =
  'For a quota sample these are rates per contact, not per sampled case: there is no sampled case to count from; no response rate is shown.';

/** Each interviewer's rates for one project: a sortable table on a desktop, cards on a phone. */
export function InterviewerRatesSection({ projectId }: { projectId: string }) {
  const rates = useInterviewerRates(projectId);
  return (
    <section aria-labelledby="pl-rates-title" className="pl-rates">
      <h2 id="pl-rates-title">Rates, flags and back-checks</h2>
      <p className="pl-rates-caution">{QUOTA_CAUTION}</p>
      <QueryView
        query={rates}
        what="the interviewers’ rates"
        offlineNote="The interviewers’ rates need the network."
        isEmpty={(data) => data.interviewers.length === 0}
        empty={
          <EmptyPanel title="No interviewers yet">
            <p>Rates appear once interviewers are on the team and log contacts.</p>
          </EmptyPanel>
        }
      >
        {(data) => <RatesContent data={data} />}
      </QueryView>
    </section>
  );
}

function RatesContent({ data }: { data: ProjectRates }) {
  const wide = useWideScreen();
  const [sort, setSort] = useState<RatesSort>({ column: 'name', direction: 'ascending' });
  const rows = sortRates(data.interviewers, sort);
  return (
    <>
      <p className="pl-small">
        AAPOR Standard Definitions: COOP1 is completes over completes, partials, refusals and other contacted eligible cases; REF2 is
        refusals and CON2 contacted cases over all eligible cases plus e times those of unknown eligibility, with e ={' '}
        {data.e === null ? 'not known yet (no resolved contact)' : formatPercent(data.e)}, the eligible share of the whole project’s
        resolved contacts. Turned away because the cell was full counts as not eligible; a non-contact counts as of unknown
        eligibility unless the interviewer knew someone eligible lived there. Voided and rejected contacts are left out.
      </p>
      {wide ? <RatesTable rows={rows} sort={sort} onSort={(column) => setSort(sortedBy(sort, column))} /> : <RatesCards rows={rows} sort={sort} onSort={setSort} />}
    </>
  );
}
