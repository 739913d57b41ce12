import { IonRouterOutlet } from '@ionic/react';
import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { Navigate, Route } from 'react-router-dom';
import { useStoredSession } from '../db/session-store';
import { ForgotPasswordPage } from '../features/auth/pages/forgot-password-page';
import { SetPasswordPage } from '../features/auth/pages/set-password-page';
import { SignInPage } from '../features/auth/pages/sign-in-page';
import { SignUpPage } from '../features/auth/pages/sign-up-page';
import { PlumblineLogo } from '../components/plumbline-logo';
import { RoleShell } from './shell/role-shell';

/** Signed out: sign-in and the pages of one-time links, forgotten passwords and sign-up. Signed in: the role's own shell. */
export function AppRoutes() {
  const session = useStoredSession();
  const queryClient = useQueryClient();
  const loaded = session !== undefined;
  const userId = session?.user.id ?? null;

  // Server data belongs to one person: drop it whenever nobody, or somebody else, is signed in
  // (sign-out, a refused refresh, or another account on the same device).
  useEffect(() => {
    if (!loaded) return;
    return () => queryClient.clear();
  }, [queryClient, loaded, userId]);

  if (session === undefined) {
    return (
      <div className="pl-splash" role="status">
        <PlumblineLogo size={56} />
        <span>Opening Plumbline…</span>
      </div>
    );
  }
  if (session === null) {
    return (
      <IonRouterOutlet>
        <Route path="/sign-in" element={<SignInPage />} />
        <Route path="/set-password" element={<SetPasswordPage />} />
        <Route path="/forgot-password" element={<ForgotPasswordPage />} />
        <Route path="/sign-up" element={<SignUpPage />} />
        <Route path="*" element={<Navigate to="/sign-in" replace />} />
      </IonRouterOutlet>
    );
  }
  return <RoleShell key={session.user.id} user={session.user} />;
}
