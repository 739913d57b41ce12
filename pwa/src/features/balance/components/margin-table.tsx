import { ScrollBox } from '../../../components/scroll-box';
import { formatPercent, formatPoints } from '../../../lib/format';
import type { BalanceMargin } from '../api/get-balance';
import { heading, WORDS } from '../../../lib/glossary';

/** The same figures as the chart, to read exactly: target, sample and weighted share. */
export function MarginTable({ variable, margins }: { variable: string; margins: BalanceMargin[] }) {
  return (
    <ScrollBox label={`${variable}: shares, scrolls sideways`}>
      <table className="pl-table pl-margin-table" aria-label={`${variable}: shares`}>
        <thead>
          <tr>
            <th scope="col">{heading(WORDS.category.one)}</th>
            <th scope="col" className="is-numeric">{heading(WORDS.target.one)}</th>
            <th scope="col" className="is-numeric">Sample</th>
            <th scope="col" className="is-numeric">Gap</th>
            <th scope="col" className="is-numeric">Weighted</th>
          </tr>
        </thead>
        <tbody>
          {margins.map((m) => (
            <tr key={m.category}>
              <th scope="row">{m.category}</th>
              <td className="is-numeric pl-figure">{formatPercent(m.target)}</td>
              <td className="is-numeric pl-figure">{formatPercent(m.unweighted)}</td>
              <td className="is-numeric pl-figure">{formatPoints(m.unweighted - m.target)}</td>
              <td className="is-numeric pl-figure">{formatPercent(m.weighted)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollBox>
  );
}
