import { useId, useState, type FormEvent } from 'react';
import { Dialog } from '../../../components/dialog';
import { FormProblem } from '../../../components/form-problem';
import type { Role } from '../../../config/roles';
import { isApiError } from '../../../lib/api-error';
import { useInvitePerson } from '../api/invite-person';
import { RoleSelect } from './role-select';

interface InviteDialogProps {
  onClose: () => void;
  onInvited: (email: string) => void;
}

/** Name, e-mail and role; the person chooses their own password through the e-mailed link. */
export function InviteDialog({ onClose, onInvited }: InviteDialogProps) {
  const invite = useInvitePerson();
  const [name, setName] = useState('');
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('interviewer');
  const ids = { name: useId(), email: useId(), role: useId() };
  const fields = isApiError(invite.error) ? invite.error.fields : [];
  const problemFor = (field: string) => fields.find((p) => p.field === field)?.message;

  function submit(event: FormEvent) {
    event.preventDefault();
    invite.mutate({ name: name.trim(), email: email.trim(), role }, { onSuccess: (person) => onInvited(person.email) });
  }

  return (
    <Dialog title="Invite a person" onClose={onClose} placement="sheet">
      <form className="pl-form" onSubmit={submit} noValidate>
        <FormProblem message={invite.isError && invite.error.message} />
        <div className="pl-field">
          <label htmlFor={ids.name}>Name</label>
          <input id={ids.name} autoComplete="off" value={name} onChange={(e) => setName(e.target.value)} aria-invalid={problemFor('name') ? true : undefined} />
          {problemFor('name') ? <span className="pl-field-problem">{problemFor('name')}</span> : null}
        </div>
        <div className="pl-field">
          <label htmlFor={ids.email}>E-mail</label>
          <input
            id={ids.email}
            type="email"
            inputMode="email"
            autoCapitalize="none"
            spellCheck={false}
            autoComplete="off"
            value={email}
            onChange={(e) => setEmail(e.target.value)}
            aria-invalid={problemFor('email') ? true : undefined}
          />
          {problemFor('email') ? <span className="pl-field-problem">{problemFor('email')}</span> : null}
        </div>
        <div className="pl-field">
          <label htmlFor={ids.role}>Role</label>
          <RoleSelect id={ids.role} value={role} onChange={setRole} />
        </div>
        <p className="pl-muted pl-small">They get an e-mail with a link to choose their password; it works once and expires after a while.</p>
        <div className="pl-dialog-actions">
          <button type="button" className="pl-button" onClick={onClose}>
            Cancel
          </button>
          <button type="submit" className="pl-button pl-button-main" disabled={invite.isPending}>
            {invite.isPending ? 'Sending…' : 'Send invitation'}
          </button>
        </div>
      </form>
    </Dialog>
  );
}
