import { formatCount, formatDecimal } from '../../../lib/format';
import type { Balance } from '../api/get-balance';

/**
 * The interviewers' effect on the headline answer beside the weighting's design effect: the
 * intra-interviewer correlation, the interviewer design effect, and the design effect from all
 * sources (Kish's weighting design effect × the interviewer's) with its effective sample size.
 */
export function InterviewerEffect({ balance }: { balance: Balance }) {
  const effect = balance.interviewerEffect;
  return (
    <div className="pl-interviewer-effect">
      <h3>With the interviewers’ effect</h3>
      {effect ? (
        <dl className="pl-figures" aria-label="Interviewer effect figures">
          <div>
            <dt>Intra-interviewer correlation ρ̂</dt>
            <dd className="pl-figure">{formatDecimal(effect.rho, 3)}</dd>
            {effect.rawRho < 0 ? <dd className="pl-small">estimated {formatDecimal(effect.rawRho, 3).replace('-', '−')}, set to 0</dd> : null}
          </div>
          <div>
            <dt>Weighted workload m*</dt>
            <dd className="pl-figure">{formatDecimal(effect.mStar, 1)}</dd>
          </div>
          <div>
            <dt>Interviewer design effect</dt>
            <dd className="pl-figure">{formatDecimal(effect.designEffect)}</dd>
          </div>
          <div>
            <dt>Design effect, all sources</dt>
            <dd className="pl-figure">{formatDecimal(effect.allSourcesDesignEffect)}</dd>
          </div>
          <div>
            <dt>Effective sample size, all sources</dt>
            <dd className="pl-figure">
              {effect.allSourcesEffectiveSampleSize === null ? '—' : formatCount(Math.round(effect.allSourcesEffectiveSampleSize))}
            </dd>
          </div>
        </dl>
      ) : (
        <p className="pl-small">Shown once at least two interviewers have completes answering yes or no.</p>
      )}
      <p className="pl-small pl-muted">
        How alike one interviewer’s answers are (Kish 1962, from {effect ? formatCount(effect.interviews) : 'the'} yes or no answers
        {effect ? ` of ${formatCount(effect.interviewers)} interviewers` : ''}). The correlation is computed on each answer minus the
        mean of its weighting cell, because quota interviewers are not assigned at random and would otherwise carry the effects of
        their areas; a negative estimate is set to 0. All sources is the weighting’s design effect times the interviewers’ (Gabler,
        Häder and Lahiri 1999).
      </p>
    </div>
  );
}
