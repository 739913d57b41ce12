import { useState } from 'react';
import { Dialog } from '../../../components/dialog';
import type { SessionUser } from '../../../db/plumbline-db';
import { AccountSummary } from './account-summary';

function initials(name: string): string {
  const parts = name.trim().split(/\s+/).filter(Boolean);
  const first = parts[0]?.[0] ?? '?';
  const last = parts.length > 1 ? (parts[parts.length - 1]?.[0] ?? '') : '';
  return (first + last).toUpperCase();
}

/** Header button on phones: the person's initials; opens who is signed in and sign-out. */
export function AccountButton({ user }: { user: SessionUser }) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <button
        type="button"
        className="pl-account-button"
        aria-label={`Account: ${user.name}`}
        aria-haspopup="dialog"
        onClick={() => setOpen(true)}
      >
        <span aria-hidden="true">{initials(user.name)}</span>
      </button>
      {open ? (
        <Dialog title="Account" placement="sheet" onClose={() => setOpen(false)}>
          <AccountSummary user={user} />
        </Dialog>
      ) : null}
    </>
  );
}
