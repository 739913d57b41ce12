import { useId, useState } from 'react';
import type { Assignment } from '../../lib/assignments/get-assignments';
import type { ProjectCell } from '../../lib/projects/get-cells';
import { FormProblem } from '../form-problem';
import type { Interviewer } from './assignments-panel';

interface AssignmentFormProps {
  person: Interviewer;
  assignment: Assignment | undefined;
  cells: ProjectCell[];
  busy: boolean;
  problem: string | undefined;
  onSave: (value: { target: number; cellIds: string[] }) => void;
  onCancel: () => void;
}

/** Completes to reach (required) and cells to work (optional: none ticked means any cell). */
export function AssignmentForm({ person, assignment, cells, busy, problem, onSave, onCancel }: AssignmentFormProps) {
  const id = useId();
  const [target, setTarget] = useState(assignment ? String(assignment.target) : '');
  const [chosen, setChosen] = useState(() => new Set(assignment?.cellIds ?? []));
  const [mistake, setMistake] = useState<string>();
  const toggle = (cellId: string) => {
    const next = new Set(chosen);
    if (next.has(cellId)) next.delete(cellId);
    else next.add(cellId);
    setChosen(next);
  };
  function submit() {
    const value = Number(target.trim());
    if (!/^\d+$/.test(target.trim()) || value < 1 || value > 1_000_000) {
      setMistake('Completes to reach must be a whole number from 1 to 1,000,000.');
      return;
    }
    setMistake(undefined);
    onSave({ target: value, cellIds: cells.filter((c) => chosen.has(c.id)).map((c) => c.id) });
  }
  return (
    <form
      className="pl-assign-form"
      aria-label={`Assignment of ${person.name}`}
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
    >
      <div className="pl-field">
        <label htmlFor={`${id}-target`}>Completes to reach</label>
        <input
          id={`${id}-target`}
          inputMode="numeric"
          value={target}
          aria-invalid={mistake ? true : undefined}
          aria-describedby={mistake ? `${id}-problem` : undefined}
          onChange={(event) => setTarget(event.target.value)}
        />
      </div>
      <FormProblem message={mistake} id={`${id}-problem`} />
      {cells.length > 0 ? (
        <fieldset className="pl-assign-cells">
          <legend>Cells to work (optional; none ticked: any cell)</legend>
          {cells.map((cell) => (
            <label key={cell.id} className="pl-assign-check">
              <input type="checkbox" checked={chosen.has(cell.id)} onChange={() => toggle(cell.id)} />
              {cell.label}
            </label>
          ))}
        </fieldset>
      ) : null}
      <FormProblem message={problem} />
      <div className="pl-form-actions">
        <button type="button" className="pl-button pl-button-quiet pl-button-small" onClick={onCancel}>
          Cancel
        </button>
        <button type="submit" className="pl-button pl-button-main pl-button-small" disabled={busy}>
          {busy ? 'Saving…' : 'Save assignment'}
        </button>
      </div>
    </form>
  );
}
