import type { BalanceMargin } from '../api/get-balance';
import { MarginChart } from './margin-chart';
import { MarginTable } from './margin-table';

/** Per quota variable: how far the sample's mix is from the population targets. */
export function SampleMix({ margins }: { margins: BalanceMargin[] }) {
  const variables = [...new Set(margins.map((m) => m.variable))];
  // One scale for every chart, with room beyond the longest bar for its label.
  const widest = Math.max(2, ...margins.map((m) => Math.abs(m.unweighted - m.target) * 100));
  const reach = Math.ceil(widest * 2.2);
  return (
    <>
      <p className="pl-chart-key pl-small">
        <span className="pl-key pl-key-over" aria-hidden="true" /> bar to the right: more of the category in the sample
        than in the population
        <span className="pl-key pl-key-under" aria-hidden="true" /> bar to the left: fewer. Gaps are in percentage
        points (pts).
      </p>
      <div className="pl-mix-grid">
        {variables.map((variable) => {
          const rows = margins.filter((m) => m.variable === variable);
          return (
            <section key={variable} className="pl-mix" aria-label={variable}>
              <h3 className="pl-mix-title">{variable}</h3>
              <MarginChart variable={variable} margins={rows} reach={reach} />
              <details className="pl-mix-details">
                <summary>Shares in figures</summary>
                <MarginTable variable={variable} margins={rows} />
              </details>
            </section>
          );
        })}
      </div>
    </>
  );
}
