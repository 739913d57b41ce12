import { useId, useState } from 'react';
import { Dialog } from '../../../components/dialog';
import { FormProblem } from '../../../components/form-problem';
import { roleLabels, type Role } from '../../../config/roles';
import type { OrganisationUser } from '../../../lib/users/get-users';
import { useChangeRole } from '../api/change-role';
import { useResendInvitation } from '../api/resend-invitation';
import { useSendPasswordReset } from '../api/send-password-reset';
import { useSetActive } from '../api/set-active';
import { RoleSelect } from './role-select';

/** One person's account: role, password-reset or invitation link, disable / enable. */
export function PersonDialog({ person, onClose }: { person: OrganisationUser; onClose: () => void }) {
  const changeRole = useChangeRole();
  const setActive = useSetActive();
  const reset = useSendPasswordReset();
  const reinvite = useResendInvitation();
  const [role, setRole] = useState<Role>(person.role);
  const [done, setDone] = useState<string | null>(null);
  const roleId = useId();
  const failed = [changeRole, setActive, reset, reinvite].find((m) => m.isError)?.error;
  const busy = [changeRole, setActive, reset, reinvite].some((m) => m.isPending);

  const say = (text: string) => () => setDone(text);

  return (
    <Dialog title={person.name} onClose={onClose} placement="sheet">
      <p className="pl-card-text">{person.email}</p>
      <FormProblem message={failed?.message} />
      {done ? (
        <p className="pl-form-note" role="status">
          {done}
        </p>
      ) : null}
      <div className="pl-field">
        <label htmlFor={roleId}>Role</label>
        <RoleSelect id={roleId} value={role} onChange={setRole} />
      </div>
      <button
        type="button"
        className="pl-button"
        disabled={busy || role === person.role}
        onClick={() => changeRole.mutate({ id: person.id, role }, { onSuccess: say(`${person.name} is now ${roleLabels[role]}.`) })}
      >
        Change role
      </button>
      <div className="pl-dialog-actions">
        {person.status === 'invited' ? (
          <button type="button" className="pl-button" disabled={busy} onClick={() => reinvite.mutate(person.id, { onSuccess: say(`A new invitation is on its way to ${person.email}.`) })}>
            Send the invitation again
          </button>
        ) : null}
        {person.status === 'active' ? (
          <button type="button" className="pl-button" disabled={busy} onClick={() => reset.mutate(person.id, { onSuccess: say(`A link to choose a new password is on its way to ${person.email}.`) })}>
            Send a password reset
          </button>
        ) : null}
        {person.active ? (
          <button type="button" className="pl-button pl-button-danger" disabled={busy} onClick={() => setActive.mutate({ id: person.id, active: false }, { onSuccess: say(`${person.name} can no longer sign in; their sign-ins have ended.`) })}>
            Disable account
          </button>
        ) : (
          <button type="button" className="pl-button" disabled={busy} onClick={() => setActive.mutate({ id: person.id, active: true }, { onSuccess: say(`${person.name} can sign in again.`) })}>
            Enable account
          </button>
        )}
        <button type="button" className="pl-button pl-button-main" onClick={onClose}>
          Done
        </button>
      </div>
    </Dialog>
  );
}
