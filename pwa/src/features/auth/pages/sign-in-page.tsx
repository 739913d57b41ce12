import { Link } from 'react-router-dom';
import { useSignUpSettings } from '../api/sign-up';
import { SignInForm } from '../components/sign-in-form';
import { SignedOutFrame } from '../components/signed-out-frame';

export function SignInPage() {
  const signUp = useSignUpSettings();
  return (
    <SignedOutFrame title="Sign in" lead="Fieldwork kept level while it runs. Use the account your agency gave you." back={false}>
      <SignInForm />
      <p className="pl-sign-in-links">
        <Link to="/forgot-password">Forgot your password?</Link>
        {signUp.data?.enabled ? <Link to="/sign-up">New agency? Start an organisation</Link> : null}
      </p>
      <p className="pl-sign-in-foot">Interviews logged on this device stay on it until the office has them, signed in or not.</p>
    </SignedOutFrame>
  );
}
