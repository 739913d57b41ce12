import { Fragment, useState } from 'react';
import { ScrollBox } from '../../../components/scroll-box';
import { formatCount, formatPercent } from '../../../lib/format';
import type { InterviewerRates } from '../api/get-interviewer-rates';
import { InterviewerDetails } from './interviewer-details';
import { flagCount, formatDuration, formatP, ratesColumns, type RatesColumn, type RatesSort } from './rates-view';

interface RatesTableProps {
  rows: InterviewerRates[];
  sort: RatesSort;
  onSort: (column: RatesColumn) => void;
}

/** The desktop table: one row per interviewer, sortable by every column; a row opens onto its days. */
export function RatesTable({ rows, sort, onSort }: RatesTableProps) {
  const [open, setOpen] = useState<string | null>(null);
  return (
    <ScrollBox label="Interviewers’ rates, scrolls sideways">
      <table className="pl-table pl-rates-table" aria-label="Interviewers’ rates">
        <thead>
          <tr>
            {ratesColumns.map((column) => {
              const sorted = sort.column === column.key;
              return (
                <th key={column.key} scope="col" aria-sort={sorted ? sort.direction : 'none'} className={column.numeric ? 'is-numeric' : undefined}>
                  <button type="button" className="pl-sort" aria-label={column.label} title={column.label} onClick={() => onSort(column.key)}>
                    {column.short}
                    <span className="pl-sort-mark" aria-hidden="true">
                      {sorted ? (sort.direction === 'ascending' ? '▲' : '▼') : '↕'}
                    </span>
                  </button>
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <Fragment key={row.interviewerId}>
              <tr>
                <th scope="row">
                  <button
                    type="button"
                    className="pl-rates-name"
                    aria-expanded={open === row.interviewerId}
                    onClick={() => setOpen(open === row.interviewerId ? null : row.interviewerId)}
                  >
                    {row.name}
                  </button>
                </th>
                <td className="is-numeric pl-figure">{formatCount(row.contacts)}</td>
                <td className="is-numeric pl-figure">{formatCount(row.completes)}</td>
                <td className="is-numeric pl-figure">{formatPercent(row.rates.COOP1)}</td>
                <td className="is-numeric pl-figure">{formatPercent(row.rates.REF2)}</td>
                <td className="is-numeric pl-figure">{formatPercent(row.rates.CON2)}</td>
                <td className="is-numeric pl-figure">{formatDuration(row.medianDurationSeconds)}</td>
                <td className="is-numeric pl-figure">{formatCount(flagCount(row))}</td>
                <td className="is-numeric pl-figure">{formatP(row.test?.adjustedPValue)}</td>
                <td className="is-numeric pl-figure">
                  {formatCount(row.backchecks.notConfirmed)} of {formatCount(row.backchecks.selected)}
                </td>
              </tr>
              {open === row.interviewerId ? (
                <tr>
                  <td colSpan={ratesColumns.length}>
                    <InterviewerDetails row={row} />
                  </td>
                </tr>
              ) : null}
            </Fragment>
          ))}
        </tbody>
      </table>
    </ScrollBox>
  );
}
