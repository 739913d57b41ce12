import { useId, useState, type FormEvent } from 'react';
import { isApiError } from '../../../lib/api-error';
import { useOnline } from '../../../hooks/use-online';
import { useSignIn } from '../api/sign-in';
import { FormProblem } from '../../../components/form-problem';

export const offlineSignInMessage =
  'You are offline: signing in needs the network once; work already on this device is kept.';

/** Field problems in the words of this form, not the API's (which name the field itself). */
const fieldWords: Record<string, string> = {
  email: 'That is not an e-mail address: check it for a typing slip.',
  password: 'Enter your password.',
};

function messageFor(error: unknown): string {
  if (isApiError(error)) {
    if (error.kind === 'offline') return offlineSignInMessage;
    // A problem with a field is shown at the field; the summary only points there.
    if (error.fields.some((f) => f.field in fieldWords)) return 'Not signed in: see the marked field below.';
    return error.message;
  }
  return 'Signing in failed. Please try again.';
}

export function SignInForm() {
  const signIn = useSignIn();
  const online = useOnline();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const ids = { email: useId(), password: useId(), problem: useId() };

  const fieldProblems = isApiError(signIn.error) ? signIn.error.fields : [];
  const problemFor = (field: string) => (fieldProblems.some((p) => p.field === field) ? fieldWords[field] : undefined);

  function submit(event: FormEvent) {
    event.preventDefault();
    signIn.mutate({ email: email.trim(), password });
  }

  return (
    <form className="pl-form" onSubmit={submit} noValidate aria-describedby={signIn.isError ? ids.problem : undefined}>
      {!online && !signIn.isError ? (
        <p className="pl-form-note" role="status">
          {offlineSignInMessage}
        </p>
      ) : null}
      <FormProblem message={signIn.isError && messageFor(signIn.error)} id={ids.problem} />

      <div className="pl-field">
        <label htmlFor={ids.email}>E-mail</label>
        <input
          id={ids.email}
          name="email"
          type="email"
          inputMode="email"
          autoComplete="username"
          autoCapitalize="none"
          spellCheck={false}
          required
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          aria-invalid={problemFor('email') ? true : undefined}
        />
        {problemFor('email') ? <span className="pl-field-problem">{problemFor('email')}</span> : null}
      </div>

      <div className="pl-field">
        <label htmlFor={ids.password}>Password</label>
        <input
          id={ids.password}
          name="password"
          type="password"
          autoComplete="current-password"
          required
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          aria-invalid={problemFor('password') ? true : undefined}
        />
        {problemFor('password') ? <span className="pl-field-problem">{problemFor('password')}</span> : null}
      </div>

      <button type="submit" className="pl-button pl-button-main" disabled={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
