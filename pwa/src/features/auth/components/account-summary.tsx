import { useState } from 'react';
import { roleLabels } from '../../../config/roles';
import type { SessionUser } from '../../../db/plumbline-db';
import { SignOutDialog } from './sign-out-dialog';

/** Who is signed in on this device, and the way out. */
export function AccountSummary({ user }: { user: SessionUser }) {
  const [confirming, setConfirming] = useState(false);
  return (
    <section className="pl-account" aria-label="Signed in as">
      <p className="pl-account-name">{user.name}</p>
      <p className="pl-account-detail">
        {roleLabels[user.role]} · {user.organisation.name}
      </p>
      <p className="pl-account-detail pl-account-email">{user.email}</p>
      <button type="button" className="pl-button pl-button-quiet pl-account-sign-out" onClick={() => setConfirming(true)}>
        Sign out
      </button>
      {confirming ? <SignOutDialog user={user} onClose={() => setConfirming(false)} /> : null}
    </section>
  );
}
