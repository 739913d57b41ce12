import './figures-methods.css';

/**
 * "How these figures are worked out": a short, folded summary on the balance page. The full
 * text, with formulas, published sources and when a figure is withheld, is docs/methods.md in
 * the repository; the app does not serve the repository's documents, so it names the file.
 */
export function FiguresMethods() {
  return (
    <details className="pl-methods">
      <summary>How these figures are worked out</summary>
      <ul>
        <li>
          The weights come from raking (Deming and Stephan 1940): the completes are weighted, variable by
          variable, until every category’s weighted share meets its population target.
        </li>
        <li>
          The design effect is Kish’s n·Σw² / (Σw)², the cost of weighting; the effective sample size is the
          number of completes divided by it.
        </li>
        <li>
          The implied bias factor compares the odds of the unweighted and weighted headline shares: 0.5 means
          no pull. It is measured against the weighted figure, not against the truth. Its 95% interval is the
          delta method with the weighting’s own uncertainty included, or, when fewer than 100 interviews give the less
          common answer, a jackknife that re-weights the sample with each interview left out; both assume the
          interviews are a random draw within their quota cells.
        </li>
        <li>
          The weighted share’s standard error is linearised through the raking (Deville and Särndal 1992); its
          95% interval is Korn and Graubard’s (1998), and a ± margin is shown only when that interval is near
          symmetric.
        </li>
        <li>
          The interval, the margin of error and the bias factor’s interval are model-based figures for a quota
          sample, not sampling guarantees.
        </li>
      </ul>
      <p className="pl-small">
        Every formula, its published source, what it assumes and when a figure is withheld: <code>docs/methods.md</code>{' '}
        in Plumbline’s source repository.
      </p>
    </details>
  );
}
