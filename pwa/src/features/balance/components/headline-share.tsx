import { ScrollBox } from '../../../components/scroll-box';
import { formatPercent } from '../../../lib/format';
import { headlineAnswerWords } from '../../../lib/fieldwork-words';
import type { Balance } from '../api/get-balance';
import { biasSentence, formatBiasFactor } from './balance-words';

type Outcome = NonNullable<Balance['outcome']>;

/** The share's base, and the answers outside it reported beside it (docs/methods.md, section 2). */
function OtherAnswers({ outcome }: { outcome: Outcome }) {
  const others = outcome.otherAnswers ?? [];
  return (
    <div className="pl-other-answers">
      <p className="pl-small">
        Shares of yes are among the {outcome.answered} {outcome.answered === 1 ? 'interview' : 'interviews'} that answered yes or no;
        every complete is weighted.
      </p>
      {others.length ? (
        <ScrollBox label="Other answers, scrolls sideways">
        <table className="pl-table pl-small" aria-label="Other answers to the headline question">
          <thead>
            <tr>
              <th scope="col">Answer</th>
              <th scope="col" className="is-numeric">
                Interviews
              </th>
              <th scope="col" className="is-numeric">
                Unweighted
              </th>
              <th scope="col" className="is-numeric">
                Weighted
              </th>
            </tr>
          </thead>
          <tbody>
            {others.map((o) => (
              <tr key={o.answer}>
                <th scope="row">{headlineAnswerWords[o.answer]}</th>
                <td className="is-numeric pl-figure">{o.count}</td>
                <td className="is-numeric pl-figure">{formatPercent(o.unweighted)}</td>
                <td className="is-numeric pl-figure">{formatPercent(o.weighted)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        </ScrollBox>
      ) : null}
    </div>
  );
}

/** The headline share before and after weighting, and how hard the sample's mix pulls it. */
export function HeadlineShare({ balance }: { balance: Balance }) {
  const outcome = balance.outcome;
  if (!outcome) {
    return <p className="pl-muted">The headline share appears with the first completed interviews that answer yes or no.</p>;
  }
  const interval = outcome.impliedBiasFactorInterval ?? null;
  const b = outcome.impliedBiasFactor ?? null;
  const withheld = balance.withheld?.some((w) => w.figure === 'impliedBiasFactorInterval') ?? false;
  return (
    <>
      <p className="pl-headline-question">“{balance.headlineQuestion}”</p>
      <dl className="pl-figures" aria-label="Headline figures">
        <div>
          <dt>Yes, unweighted</dt>
          <dd className="pl-figure">{formatPercent(outcome.unweighted)}</dd>
        </div>
        <div>
          <dt>Yes, weighted</dt>
          <dd className="pl-figure">{outcome.weighted === undefined ? '—' : formatPercent(outcome.weighted)}</dd>
        </div>
        <div>
          <dt>Implied bias factor</dt>
          <dd className="pl-figure">{b === null ? '—' : formatBiasFactor(b)}</dd>
        </div>
        <div>
          <dt>Its 95% interval</dt>
          <dd className="pl-figure">
            {interval ? `${formatBiasFactor(interval[0])} – ${formatBiasFactor(interval[1])}` : withheld ? 'Withheld' : '—'}
          </dd>
        </div>
      </dl>
      <OtherAnswers outcome={outcome} />
      {interval && outcome.weighted !== undefined ? (
        <p className="pl-bias-sentence">{biasSentence(interval, outcome.unweighted, outcome.weighted)}</p>
      ) : null}
      <p className="pl-small pl-muted">
        The implied bias factor is the share the raw sample would show if, after weighting, the answer split 50/50.
        0.5 means the sample’s mix does not pull the headline share at all; above 0.5 the raw sample says “yes” more
        often than the weighted figure, below 0.5 less often. It is measured against the weighted figure, not
        against the truth, and its interval assumes the interviews are a random draw within their quota cells, which a
        quota sample only approximates.
      </p>
    </>
  );
}
