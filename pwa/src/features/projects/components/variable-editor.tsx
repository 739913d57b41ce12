import { useState } from 'react';
import { formatDecimal } from '../../../lib/format';
import { RemoveVariableDialog } from './remove-variable-dialog';
import { blankCategory, renamed, shareTotal, type DraftCategory, type DraftVariable } from './targets-draft';

interface VariableEditorProps {
  variable: DraftVariable;
  position: number;
  onChange: (variable: DraftVariable) => void;
  onRemove: () => void;
  /** Counted interviews a saved category holds (0 for a new one). */
  held: (categoryId: string | undefined) => number;
  /** Mid-field, removing any saved category asks first. */
  inField: boolean;
}

/** One quota variable: its name shown and column in files, whether it interlocks, its categories and their shares. */
export function VariableEditor({ variable, position, onChange, onRemove, held, inField }: VariableEditorProps) {
  const [removing, setRemoving] = useState<DraftCategory | null>(null);
  const name = variable.name.trim() || `variable ${position}`;
  const total = shareTotal(variable);
  const setCategory = (index: number, change: Partial<DraftCategory>) =>
    onChange({ ...variable, categories: variable.categories.map((c, i) => (i === index ? { ...c, ...change } : c)) });
  const drop = (category: DraftCategory) => onChange({ ...variable, categories: variable.categories.filter((c) => c.key !== category.key) });
  const askToDrop = (category: DraftCategory) => (category.id && (inField || held(category.id) > 0) ? setRemoving(category) : drop(category));

  return (
    <fieldset className="pl-variable">
      <legend className="pl-visually-hidden">Quota variable {position}</legend>
      <div className="pl-variable-head">
        <label className="pl-inline-field">
          <span>Name shown</span>
          <input className="pl-input" value={variable.name} onChange={(e) => onChange(renamed(variable, e.target.value))} placeholder="e.g. Age band" />
        </label>
        <label className="pl-inline-field">
          <span>Column in files</span>
          <input
            className="pl-input"
            value={variable.columnName}
            spellCheck={false}
            autoCapitalize="none"
            onChange={(e) => onChange({ ...variable, columnName: e.target.value, columnEdited: true })}
            placeholder="e.g. age_band"
          />
        </label>
        <label className="pl-check">
          <input type="checkbox" checked={variable.interlocked} onChange={(e) => onChange({ ...variable, interlocked: e.target.checked })} />
          Interlock {name}
        </label>
      </div>
      <table className="pl-share-table">
        <thead>
          <tr>
            <th scope="col">Category</th>
            <th scope="col">Share</th>
            <th scope="col">
              <span className="pl-visually-hidden">Remove</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {variable.categories.map((category, index) => (
            <tr key={category.key}>
              <td>
                <input
                  className="pl-input"
                  aria-label={`${name}: category ${index + 1}`}
                  value={category.label}
                  onChange={(e) => setCategory(index, { label: e.target.value })}
                />
              </td>
              <td>
                <input
                  className="pl-input pl-share-input"
                  inputMode="decimal"
                  aria-label={`${name}: share of ${category.label.trim() || `category ${index + 1}`}`}
                  value={category.share}
                  onChange={(e) => setCategory(index, { share: e.target.value })}
                />
              </td>
              <td>
                <button
                  type="button"
                  className="pl-button pl-button-quiet pl-button-small"
                  aria-label={`Remove ${category.label.trim() || `category ${index + 1}`} from ${name}`}
                  onClick={() => askToDrop(category)}
                >
                  ✕
                </button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="pl-share-total pl-small" aria-live="polite">
        Total of {name}: <span className="pl-figure">{formatDecimal(total, 2)}</span>
        {Math.abs(total - 100) > 0.005 && Math.abs(total - 1) > 0.00005 && total > 0 ? ' — shares are scaled to 100% when saved' : ''}
      </p>
      <div className="pl-variable-actions">
        <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={() => onChange({ ...variable, categories: [...variable.categories, blankCategory()] })}>
          Add a category to {name}
        </button>
        <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={onRemove}>
          Remove {name}
        </button>
      </div>
      {removing ? (
        <RemoveVariableDialog
          what="category"
          name={removing.label.trim() || 'this category'}
          interviews={held(removing.id)}
          onConfirm={() => {
            drop(removing);
            setRemoving(null);
          }}
          onCancel={() => setRemoving(null)}
        />
      ) : null}
    </fieldset>
  );
}
