/** The cautions of the design (section 5), on every balance page. */
export function BalanceCautions() {
  return (
    <section className="pl-cautions" aria-labelledby="pl-cautions-heading">
      <h2 id="pl-cautions-heading">Read these figures with care</h2>
      <ul>
        <li>
          This is a quota sample, not a probability sample. The weighted share’s interval (shown with a ± only when it is
          near symmetric) and the interval of the bias factor are model-based figures under assumptions about the sample,
          not a sampling guarantee. Design effect and effective sample size are the cost of weighting, not the share’s error.
        </li>
        <li>
          Respondent privacy: Plumbline keeps no names, addresses or phone numbers of respondents, only their cells,
          answers and how the interview went. Keep it that way in anything you pass on.
        </li>
        <li>
          Publish figures only as the disclosure codes of the trade and local law require: sample size, field dates, mode,
          quota and weighting variables, design effect and margin of error with its caveats.
        </li>
      </ul>
    </section>
  );
}
