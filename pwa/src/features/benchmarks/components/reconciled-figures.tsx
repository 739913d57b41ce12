import { ScrollBox } from '../../../components/scroll-box';
import { formatCount, formatDecimal, formatPercent } from '../../../lib/format';
import type { Reconciliation } from '../api/get-reconciliation';
import { biasWords } from './reconciliation-words';

/** The reconciled share, each group's bias factor and each poll's chance-outlier probability. */
export function ReconciledFigures({ reconciliation: r }: { reconciliation: Reconciliation }) {
  if (!r.truth) return <p className="pl-muted">{r.problem}</p>;
  return (
    <>
      <p className="pl-benchmark-truth">
        Likely true share: <strong>{formatPercent(r.truth.median)}</strong>
        <span className="pl-muted"> (95% interval {formatPercent(r.truth.lower)} to {formatPercent(r.truth.upper)})</span>
      </p>
      <div className="pl-benchmark-tables">
      <ScrollBox label="Bias factor of each method group">
        <table className="pl-table" aria-label="Bias factor of each method group">
          <thead>
            <tr><th scope="col">Method group</th><th scope="col">Bias factor</th><th scope="col">Overstates</th><th scope="col">Understates</th></tr>
          </thead>
          <tbody>
            {r.groups.map((g) => (
              <tr key={g.name}>
                <th scope="row">{g.name}<span className="pl-small pl-muted pl-benchmark-note"> ({biasWords(g.bias.kind, g.bias.factor, g.bias.spread)})</span></th>
                <td>{formatDecimal(g.meanFactor, 3)}{g.bias.kind === 'unknown' ? <span className="pl-small pl-muted"> ({formatDecimal(g.lower, 3)}–{formatDecimal(g.upper, 3)})</span> : null}</td>
                <td>{formatPercent(g.probOverstates, 0)}</td>
                <td>{formatPercent(g.probUnderstates, 0)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
      <ScrollBox label="Chance-outlier probability of each poll">
        <table className="pl-table" aria-label="Chance-outlier probability of each poll">
          <thead>
            <tr><th scope="col">Poll</th><th scope="col">Yes</th><th scope="col">Chance-outlier probability</th></tr>
          </thead>
          <tbody>
            {r.polls.map((p) => (
              <tr key={p.id}>
                <th scope="row">{p.source}<span className="pl-small pl-muted pl-benchmark-note"> ({p.methodGroup})</span></th>
                <td>{formatPercent(p.successes / p.trials)}<span className="pl-small pl-muted"> of {formatCount(p.trials)}{p.own ? ' effective' : ''}</span></td>
                <td>{formatPercent(p.chanceOutlierProbability, 1)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
      </div>
    </>
  );
}
