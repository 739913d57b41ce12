import { FormProblem } from '../../../components/form-problem';
import { heading, WORDS } from '../../../lib/glossary';
import { formatCount } from '../../../lib/format';
import { useMergeRetired } from '../api/merge-retired';
import type { Balance } from '../api/get-balance';

const interviews = (n: number) => `${formatCount(n)} ${n === 1 ? WORDS.interview.one : WORDS.interview.many}`;

/**
 * Categories taken out of the targets after interviews were logged in them. Raking needs a
 * target for every category, so their interviews are left out of weighting unless the lead
 * chooses a current category of the same variable to count them as.
 */
export function RetiredCategories({ projectId, balance, editable }: { projectId: string; balance: Balance; editable: boolean }) {
  const merge = useMergeRetired(projectId);
  if (balance.retired.length === 0) return null;
  const left = balance.retired.filter((r) => r.mergedInto === null);
  return (
    <section className="pl-section" aria-labelledby="pl-retired-heading">
      <h2 id="pl-retired-heading" className="pl-section-title">{heading(WORDS.retired.many)}</h2>
      {balance.notWeighted > 0 ? (
        <p role="note">
          {interviews(balance.notWeighted)} in {WORDS.retired.many} are not weighted: {left.map((r) => `${r.variable}: ${r.category}`).join(', ')}.
          They are kept, with the category they were logged in; choose a current category to count them as, or leave them out.
        </p>
      ) : (
        <p>Every interview in a {WORDS.retired.one} is counted as a current category of its variable.</p>
      )}
      <ul className="pl-retired-list">
        {balance.retired.map((r) => (
          <li key={r.id}>
            <span>
              {r.variable}: {r.category} ({interviews(r.interviews)})
            </span>{' '}
            {editable ? (
              <label className="pl-inline-field">
                <span>Count as</span>
                <select
                  aria-label={`Count ${r.variable}: ${r.category} as`}
                  className="pl-input"
                  value={r.mergedInto ?? ''}
                  disabled={merge.isPending}
                  onChange={(e) => merge.mutate({ categoryId: r.id, mergedInto: e.target.value || null })}
                >
                  <option value="">Not weighted</option>
                  {r.choices.map((c) => (
                    <option key={c.id} value={c.id}>
                      {c.label}
                    </option>
                  ))}
                </select>
              </label>
            ) : (
              <span>{r.mergedIntoLabel ? `counted as ${r.mergedIntoLabel}` : 'not weighted'}</span>
            )}
          </li>
        ))}
      </ul>
      <FormProblem message={merge.error?.message} />
    </section>
  );
}
