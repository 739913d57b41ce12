import type { QuotaVariable } from '../../../db/plumbline-db';

interface ObservedCategoriesProps {
  variables: QuotaVariable[];
  chosen: Record<string, string>;
  onChange: (variableId: string, categoryId: string | undefined) => void;
}

/**
 * For a partial or a refusal: the categories the interviewer could see, all optional, so
 * nonresponse can be compared by cell. Choosing a chosen category again clears it.
 */
export function ObservedCategories({ variables, chosen, onChange }: ObservedCategoriesProps) {
  return (
    <fieldset className="pl-observed">
      <legend className="pl-variable-name">What could you see? (optional)</legend>
      {variables.map((variable) => (
        <div key={variable.id} className="pl-variable">
          <p id={`pl-seen-${variable.id}`} className="pl-small">
            {variable.name}
          </p>
          <div role="radiogroup" aria-labelledby={`pl-seen-${variable.id}`} className="pl-category-grid">
            {variable.categories.map((category) => {
              const selected = chosen[variable.id] === category.id;
              return (
                <button
                  key={category.id}
                  type="button"
                  role="radio"
                  aria-checked={selected}
                  className={`pl-category ${selected ? 'is-selected' : ''}`}
                  onClick={() => onChange(variable.id, selected ? undefined : category.id)}
                >
                  {category.label}
                </button>
              );
            })}
          </div>
        </div>
      ))}
    </fieldset>
  );
}
