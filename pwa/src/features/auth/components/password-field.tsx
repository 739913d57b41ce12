import { useId } from 'react';

/** A new password with the rule said up front; the server checks it (length, spaces, common passwords). */
export function PasswordField({ value, onChange, problem }: { value: string; onChange: (value: string) => void; problem?: string }) {
  const id = useId();
  const hint = useId();
  return (
    <div className="pl-field">
      <label htmlFor={id}>New password</label>
      <input
        id={id}
        type="password"
        autoComplete="new-password"
        value={value}
        onChange={(e) => onChange(e.target.value)}
        aria-describedby={hint}
        aria-invalid={problem ? true : undefined}
      />
      <span id={hint} className="pl-muted pl-small">
        At least 12 characters. A few unrelated words make a good one; common passwords are refused.
      </span>
      {problem ? <span className="pl-field-problem">{problem}</span> : null}
    </div>
  );
}
