import { RadioGroup } from '../../../components/radio-group';
import type { QuotaVariable } from '../../../db/plumbline-db';

interface CategoriesStepProps {
  variables: QuotaVariable[];
  chosen: Record<string, string>;
  onChange: (variableId: string, categoryId: string) => void;
  onNext: () => void;
}

/** Step 2 of a complete: the respondent's category on each quota variable. */
export function CategoriesStep({ variables, chosen, onChange, onNext }: CategoriesStepProps) {
  const missing = variables.filter((v) => !chosen[v.id]).length;
  return (
    <section aria-labelledby="pl-categories-title">
      <h2 id="pl-categories-title" className="pl-step-title" tabIndex={-1}>
        Who is the respondent?
      </h2>
      {variables.map((variable) => (
        <div key={variable.id} className="pl-variable">
          <h3 id={`pl-var-${variable.id}`} className="pl-variable-name">
            {variable.name}
          </h3>
          <RadioGroup
            labelledBy={`pl-var-${variable.id}`}
            options={variable.categories.map((category) => ({ value: category.id, label: category.label }))}
            value={chosen[variable.id]}
            onChoose={(categoryId) => onChange(variable.id, categoryId)}
            className="pl-category-grid"
          />
        </div>
      ))}
      <div className="pl-step-actions">
        <button type="button" className="pl-button pl-button-main pl-button-wide" disabled={missing > 0} onClick={onNext}>
          Check their cells
        </button>
        {missing > 0 ? (
          <p className="pl-muted pl-small">
            {missing === 1 ? 'One more to choose.' : `${missing} more to choose.`}
          </p>
        ) : null}
      </div>
    </section>
  );
}
