import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { FormProblem } from '../../../components/form-problem';
import { isApiError } from '../../../lib/api-error';
import { useLinkDetails, useSetPasswordWithLink } from '../api/one-time-link';
import { useSignIn } from '../api/sign-in';
import { PasswordField } from '../components/password-field';
import { SignedOutFrame } from '../components/signed-out-frame';

/** The token from the link's "#token=…"; taken off the address bar so it is not left in history. */
function takeToken(): string {
  const token = new URLSearchParams(window.location.hash.slice(1)).get('token') ?? '';
  if (token) window.history.replaceState(window.history.state, '', window.location.pathname);
  return token;
}

/** Where an invitation or a password-reset link lands: choose a password, then be signed in. */
export function SetPasswordPage() {
  const [token] = useState(takeToken);
  const details = useLinkDetails(token);
  const setPassword = useSetPasswordWithLink();
  const signIn = useSignIn();
  const [password, setPasswordValue] = useState('');

  if (!token || details.isError) {
    const message = !token ? 'This page needs the link from your e-mail, opened whole.' : details.error?.message;
    return (
      <SignedOutFrame title="This link cannot be used">
        <FormProblem message={message} />
        <p>
          A link works once and for a limited time. <Link to="/forgot-password">Ask for a new password link</Link>, or ask your administrator to
          send the invitation again.
        </p>
      </SignedOutFrame>
    );
  }
  if (!details.data) {
    return (
      <SignedOutFrame title="Choose your password" back={false}>
        <p role="status">Checking your link…</p>
      </SignedOutFrame>
    );
  }

  const { purpose, name, email, organisation } = details.data;
  const failed = setPassword.error ?? signIn.error;
  const fieldProblem = isApiError(setPassword.error) ? setPassword.error.fields.find((f) => f.field === 'password')?.message : undefined;

  function submit(event: FormEvent) {
    event.preventDefault();
    setPassword.mutate({ token, password }, { onSuccess: (done) => signIn.mutate({ email: done.email, password }) });
  }

  return (
    <SignedOutFrame
      title={purpose === 'invitation' ? 'Choose your password' : 'Choose a new password'}
      lead={purpose === 'invitation' ? `Welcome, ${name}: your account at ${organisation} is ready once you choose a password.` : `For ${name} at ${organisation}.`}
      back={false}
    >
      <form className="pl-form" onSubmit={submit} noValidate>
        <FormProblem message={!fieldProblem && failed?.message} />
        <div className="pl-field">
          <label htmlFor="set-password-email">E-mail</label>
          <input id="set-password-email" type="email" autoComplete="username" value={email} readOnly />
        </div>
        <PasswordField value={password} onChange={setPasswordValue} problem={fieldProblem} />
        <button type="submit" className="pl-button pl-button-main" disabled={setPassword.isPending || signIn.isPending}>
          {setPassword.isPending || signIn.isPending ? 'Saving…' : 'Save password and sign in'}
        </button>
      </form>
    </SignedOutFrame>
  );
}
