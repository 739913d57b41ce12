/** What a projection can and cannot say (docs/methods.md, "Projection to the end of fieldwork"). */
export function ProjectionCaution() {
  return (
    <section className="pl-projection-caution" aria-labelledby="pl-projection-caution-heading">
      <h2 id="pl-projection-caution-heading">Read this projection with care</h2>
      <ul>
        <li>
          A projection assumes the recent pace continues: the completes per field day over the last 7 full days, carried to
          the field end. It knows nothing of interviewers joining or leaving, weekends, or cells closed later.
        </li>
        <li>
          The ranges come from a count model (Poisson days with the pace itself uncertain: a negative binomial). They widen
          the further the field end is, and assume the days to come are like the recent ones.
        </li>
      </ul>
    </section>
  );
}
