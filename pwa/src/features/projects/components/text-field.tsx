import { useId, type InputHTMLAttributes } from 'react';

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: string;
  problem?: string;
  hint?: string;
}

/** A labelled input with its problem (if any) said under it in words. */
export function TextField({ label, problem, hint, ...input }: TextFieldProps) {
  const id = useId();
  const noteId = `${id}-note`;
  return (
    <div className="pl-field">
      <label htmlFor={id}>{label}</label>
      <input id={id} aria-invalid={problem ? true : undefined} aria-describedby={problem || hint ? noteId : undefined} {...input} />
      {problem ? (
        <span id={noteId} className="pl-field-problem">
          {problem}
        </span>
      ) : hint ? (
        <span id={noteId} className="pl-small pl-muted">
          {hint}
        </span>
      ) : null}
    </div>
  );
}
