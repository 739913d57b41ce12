import { formatCount, formatDecimal } from '../../../lib/format';
import type { Balance } from '../api/get-balance';
import { formatMarginOfError, formatShareInterval, symmetricHalfWidth } from './balance-words';

/**
 * The weighting's cost in precision (Kish's design effect and effective sample size) and the
 * weighted share's own 95% interval, with a ± figure only when the interval is near symmetric.
 */
export function BalanceFigures({ balance }: { balance: Balance }) {
  const outcome = balance.outcome;
  const interval = outcome?.interval ?? null;
  const halfWidth = interval && outcome?.weighted !== undefined ? symmetricHalfWidth(outcome.weighted, interval) : null;
  const withheld = balance.withheld?.find((w) => w.figure === 'interval');
  return (
    <>
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
          <dt>Weighted share, 95% interval</dt>
          <dd className="pl-figure">{interval ? formatShareInterval(interval) : withheld ? 'Withheld' : '—'}</dd>
        </div>
        {halfWidth === null ? null : (
          <div>
            <dt>Margin of error (95%)</dt>
            <dd className="pl-figure">{formatMarginOfError(halfWidth)}</dd>
          </div>
        )}
      </dl>
      {withheld ? (
        <p className="pl-withheld" role="note">
          The weighted share’s interval, its margin of error and the bias factor’s interval are withheld because{' '}
          {withheld.reason}. They would look more certain than the data allow.
        </p>
      ) : null}
    </>
  );
}
