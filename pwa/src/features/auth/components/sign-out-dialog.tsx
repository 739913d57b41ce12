import { Dialog } from '../../../components/dialog';
import { FormProblem } from '../../../components/form-problem';
import { useUnsentCount } from '../../../db/outbox-store';
import type { SessionUser } from '../../../db/plumbline-db';
import { useSignOut } from '../api/sign-out';
import { WORDS } from '../../../lib/glossary';

interface SignOutDialogProps {
  user: SessionUser;
  onClose: () => void;
}

function interviews(count: number): string {
  return count === 1 ? `1 ${WORDS.unsent.one}` : `${count} ${WORDS.unsent.many}`;
}

export function SignOutDialog({ user, onClose }: SignOutDialogProps) {
  const unsent = useUnsentCount(user.id);
  const signOut = useSignOut();

  return (
    <Dialog title="Sign out of Plumbline?" onClose={onClose}>
      {unsent && unsent > 0 ? (
        <p className="pl-dialog-warning">
          {interviews(unsent)} will stay on this device. They will be sent after {user.name} signs in
          again on this device.
        </p>
      ) : (
        <p>Nothing is waiting to be sent from this device.</p>
      )}
      <FormProblem message={signOut.isError && 'Signing out did not finish. Please try again.'} />
      <div className="pl-dialog-actions">
        <button type="button" className="pl-button pl-button-quiet" onClick={onClose} autoFocus>
          Stay signed in
        </button>
        <button
          type="button"
          className="pl-button pl-button-main"
          disabled={signOut.isPending}
          onClick={() => signOut.mutate()}
        >
          Sign out
        </button>
      </div>
    </Dialog>
  );
}
