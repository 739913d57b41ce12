import { useId, useState, type FormEvent } from 'react';
import { FormProblem } from '../../../components/form-problem';
import { isApiError } from '../../../lib/api-error';
import { useSignUp } from '../api/sign-up';
import { SignedOutFrame } from '../components/signed-out-frame';

/** A new agency: its organisation and first admin, who confirms the address through the e-mailed link. */
export function SignUpPage() {
  const signUp = useSignUp();
  const [form, setForm] = useState({ organisation: '', name: '', email: '' });
  const ids = { organisation: useId(), name: useId(), email: useId() };
  const fields = isApiError(signUp.error) ? signUp.error.fields : [];
  const problemFor = (field: string) => fields.find((p) => p.field === field)?.message;
  const edit = (key: keyof typeof form) => (e: { target: { value: string } }) => setForm({ ...form, [key]: e.target.value });

  function submit(event: FormEvent) {
    event.preventDefault();
    signUp.mutate({ organisation: form.organisation.trim(), name: form.name.trim(), email: form.email.trim() });
  }

  return (
    <SignedOutFrame title="Start an organisation" lead="For a fieldwork agency new to Plumbline. You become its administrator and invite your team.">
      {signUp.isSuccess ? (
        <p className="pl-form-note" role="status">
          {signUp.data.message}.
        </p>
      ) : (
        <form className="pl-form" onSubmit={submit} noValidate>
          <FormProblem message={signUp.isError && signUp.error.message} />
          {(['organisation', 'name', 'email'] as const).map((key) => (
            <div className="pl-field" key={key}>
              <label htmlFor={ids[key]}>{{ organisation: 'Organisation', name: 'Your name', email: 'Your e-mail' }[key]}</label>
              <input
                id={ids[key]}
                type={key === 'email' ? 'email' : 'text'}
                autoComplete={key === 'email' ? 'email' : key === 'name' ? 'name' : 'organization'}
                value={form[key]}
                onChange={edit(key)}
                aria-invalid={problemFor(key) ? true : undefined}
              />
              {problemFor(key) ? <span className="pl-field-problem">{problemFor(key)}</span> : null}
            </div>
          ))}
          <button type="submit" className="pl-button pl-button-main" disabled={signUp.isPending}>
            {signUp.isPending ? 'Sending…' : 'Create the organisation'}
          </button>
        </form>
      )}
    </SignedOutFrame>
  );
}
