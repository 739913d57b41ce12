// The optional respondent reference on a complete: a code from the agency's own contact sheet,
// so a supervisor can call the respondent back. The device checks it with the server's rule
// (@plumbline/cell-rules/respondent-reference, on saving); the server keeps it only if the interview is
// selected for a back-check and deletes it some days after the call (data minimisation).
import { useId } from 'react';
import { FormProblem } from '../../../components/form-problem';
import './reference-field.css';

interface ReferenceFieldProps {
  value: string;
  onChange: (value: string) => void;
  problem: string | undefined;
}

export function ReferenceField({ value, onChange, problem }: ReferenceFieldProps) {
  const id = useId();
  return (
    <div className="pl-field pl-reference">
      <label htmlFor={`${id}-reference`}>Contact-sheet reference (optional)</label>
      <p className="pl-muted pl-small" id={`${id}-hint`}>
        A code from your contact sheet — never a name, address or phone number. Kept only if this interview is picked for a
        back-check, then deleted.
      </p>
      <input
        id={`${id}-reference`}
        value={value}
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        aria-invalid={problem ? true : undefined}
        aria-describedby={problem ? `${id}-hint ${id}-problem` : `${id}-hint`}
        onChange={(event) => onChange(event.target.value)}
      />
      <FormProblem message={problem} id={`${id}-problem`} />
    </div>
  );
}
