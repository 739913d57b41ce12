import { roleLabels } from '../../../config/roles';
import { formatDate } from '../../../lib/format';
import type { OrganisationUser } from '../../../lib/users/get-users';

export function PeopleList({ people }: { people: OrganisationUser[] }) {
  const sorted = [...people].sort((a, b) => a.name.localeCompare(b.name));
  return (
    <ul className="pl-card-list pl-people" aria-label="People">
      {sorted.map((person) => (
        <li key={person.id} className="pl-card pl-person">
          <div className="pl-card-head">
            <h2 className="pl-card-title">{person.name}</h2>
            <span className={`pl-tag pl-role-${person.role}`}>{roleLabels[person.role] ?? person.role}</span>
          </div>
          <p className="pl-card-text">{person.email}</p>
          <p className="pl-muted pl-small">Account since {formatDate(person.createdAt)}</p>
        </li>
      ))}
    </ul>
  );
}
