import { useId, useState, type FormEvent } from 'react';
import { FormProblem } from '../../../components/form-problem';
import { useRequestPasswordReset } from '../api/request-reset';
import { SignedOutFrame } from '../components/signed-out-frame';

export function ForgotPasswordPage() {
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const id = useId();

  function submit(event: FormEvent) {
    event.preventDefault();
    request.mutate(email.trim());
  }

  return (
    <SignedOutFrame title="Forgot your password?" lead="We e-mail you a link to choose a new one. It works once and for a limited time.">
      {request.isSuccess ? (
        <p className="pl-form-note" role="status">
          {request.data.message}. Check your inbox.
        </p>
      ) : (
        <form className="pl-form" onSubmit={submit} noValidate>
          <FormProblem message={request.isError && request.error.message} />
          <div className="pl-field">
            <label htmlFor={id}>E-mail</label>
            <input id={id} type="email" inputMode="email" autoComplete="username" autoCapitalize="none" spellCheck={false} value={email} onChange={(e) => setEmail(e.target.value)} />
          </div>
          <button type="submit" className="pl-button pl-button-main" disabled={request.isPending}>
            {request.isPending ? 'Sending…' : 'Send me a link'}
          </button>
        </form>
      )}
    </SignedOutFrame>
  );
}
