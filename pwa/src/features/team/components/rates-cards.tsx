import { useState } from 'react';
import { formatCount, formatPercent } from '../../../lib/format';
import type { InterviewerRates } from '../api/get-interviewer-rates';
import { InterviewerDetails, OutcomeMix } from './interviewer-details';
import { flagCount, formatDuration, formatP, ratesColumns, type RatesSort } from './rates-view';

interface RatesCardsProps {
  rows: InterviewerRates[];
  sort: RatesSort;
  onSort: (sort: RatesSort) => void;
}

/** The phone layout: a card per interviewer, ordered by a select; a card opens onto its days. */
export function RatesCards({ rows, sort, onSort }: RatesCardsProps) {
  const [open, setOpen] = useState<string | null>(null);
  return (
    <>
      <label className="pl-rates-sort">
        Sort by
        <select
          value={`${sort.column} ${sort.direction}`}
          onChange={(event) => {
            const [column, direction] = event.target.value.split(' ') as [RatesSort['column'], RatesSort['direction']];
            onSort({ column, direction });
          }}
        >
          {ratesColumns.flatMap((c) => [
            <option key={`${c.key}-d`} value={`${c.key} ${c.numeric ? 'descending' : 'ascending'}`}>
              {c.label}, {c.numeric ? 'highest first' : 'A to Z'}
            </option>,
            <option key={`${c.key}-a`} value={`${c.key} ${c.numeric ? 'ascending' : 'descending'}`}>
              {c.label}, {c.numeric ? 'lowest first' : 'Z to A'}
            </option>,
          ])}
        </select>
      </label>
      <ul className="pl-rates-cards" aria-label="Interviewers’ rates">
        {rows.map((row) => (
          <li key={row.interviewerId} className="pl-rates-card">
            <h3>{row.name}</h3>
            <dl className="pl-rates-figures">
              <dt>Contacts</dt>
              <dd className="pl-figure">{formatCount(row.contacts)}</dd>
              <dt>Completes</dt>
              <dd className="pl-figure">{formatCount(row.completes)}</dd>
              <dt>COOP1</dt>
              <dd className="pl-figure">{formatPercent(row.rates.COOP1)}</dd>
              <dt>REF2</dt>
              <dd className="pl-figure">{formatPercent(row.rates.REF2)}</dd>
              <dt>CON2</dt>
              <dd className="pl-figure">{formatPercent(row.rates.CON2)}</dd>
              <dt>Median length</dt>
              <dd className="pl-figure">{formatDuration(row.medianDurationSeconds)}</dd>
              <dt>Flags</dt>
              <dd className="pl-figure">{formatCount(flagCount(row))}</dd>
              <dt>Answer test, adjusted p</dt>
              <dd className="pl-figure">{formatP(row.test?.adjustedPValue)}</dd>
              <dt>Back-checks not confirmed</dt>
              <dd className="pl-figure">
                {formatCount(row.backchecks.notConfirmed)} of {formatCount(row.backchecks.selected)}
              </dd>
            </dl>
            <OutcomeMix row={row} />
            <button
              type="button"
              className="pl-button pl-button-quiet"
              aria-expanded={open === row.interviewerId}
              aria-label={`Flags, back-checks and days of ${row.name}`}
              onClick={() => setOpen(open === row.interviewerId ? null : row.interviewerId)}
            >
              Flags, back-checks and days
            </button>
            {open === row.interviewerId ? <InterviewerDetails row={row} /> : null}
          </li>
        ))}
      </ul>
    </>
  );
}
