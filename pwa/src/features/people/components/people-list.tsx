import { roleLabels } from '../../../config/roles';
import { formatDate } from '../../../lib/format';
import type { OrganisationUser } from '../../../lib/users/get-users';

const STATUS_LABELS = { invited: 'Invited', disabled: 'Disabled', active: null } as const;

interface PeopleListProps {
  people: OrganisationUser[];
  /** Who is looking: their own account has no Manage button (no admin can lock themselves out). */
  selfId?: string;
  onManage?: (person: OrganisationUser) => void;
}

export function PeopleList({ people, selfId, onManage }: PeopleListProps) {
  const sorted = [...people].sort((a, b) => a.name.localeCompare(b.name));
  return (
    <ul className="pl-card-list pl-people" aria-label="People">
      {sorted.map((person) => (
        <li key={person.id} className={`pl-card pl-person${person.active ? '' : ' pl-person-disabled'}`}>
          <div className="pl-card-head">
            <h2 className="pl-card-title">{person.name}</h2>
            <span className={`pl-tag pl-role-${person.role}`}>{roleLabels[person.role] ?? person.role}</span>
          </div>
          <p className="pl-card-text">{person.email}</p>
          <div className="pl-person-foot">
            <p className="pl-muted pl-small">
              {STATUS_LABELS[person.status] ? <strong className="pl-person-status">{STATUS_LABELS[person.status]} · </strong> : null}
              Account since {formatDate(person.createdAt)}
            </p>
            {onManage && person.id !== selfId ? (
              <button type="button" className="pl-button pl-button-small" onClick={() => onManage(person)} aria-label={`Manage ${person.name}`}>
                Manage
              </button>
            ) : null}
          </div>
        </li>
      ))}
    </ul>
  );
}
