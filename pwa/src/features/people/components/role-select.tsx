import { roleLabels, roles, type Role } from '../../../config/roles';

/** The five roles as a native select (a phone shows its own picker). */
export function RoleSelect({ id, value, onChange }: { id: string; value: Role; onChange: (role: Role) => void }) {
  return (
    <select id={id} className="pl-select" value={value} onChange={(e) => onChange(e.target.value as Role)}>
      {roles.map((role) => (
        <option key={role} value={role}>
          {roleLabels[role]}
        </option>
      ))}
    </select>
  );
}
