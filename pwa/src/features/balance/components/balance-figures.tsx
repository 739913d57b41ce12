import { formatCount, formatDecimal } from '../../../lib/format';
import type { Balance } from '../api/get-balance';
import { formatMarginOfError } from './balance-words';

/** The weighting's cost in precision: design effect, effective sample size, margin of error. */
export function BalanceFigures({ balance }: { balance: Balance }) {
  const moe = balance.outcome?.marginOfError;
  return (
    <dl className="pl-figures" aria-label="Weighting figures">
      <div>
        <dt>Completed interviews</dt>
        <dd className="pl-figure">{formatCount(balance.n)}</dd>
      </div>
      <div>
        <dt>Design effect</dt>
        <dd className="pl-figure">{formatDecimal(balance.designEffect)}</dd>
      </div>
      <div>
        <dt>Effective sample size</dt>
        <dd className="pl-figure">
          {balance.effectiveSampleSize === null ? '—' : formatCount(Math.round(balance.effectiveSampleSize))}
        </dd>
      </div>
      <div>
        <dt>Margin of error (95%)</dt>
        <dd className="pl-figure">{moe === undefined ? '—' : formatMarginOfError(moe)}</dd>
      </div>
    </dl>
  );
}
