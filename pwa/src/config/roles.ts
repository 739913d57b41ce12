export const roles = ['admin', 'lead', 'supervisor', 'interviewer', 'client'] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  admin: 'Administrator',
  lead: 'Project lead',
  supervisor: 'Supervisor',
  interviewer: 'Interviewer',
  client: 'Client',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (roles as readonly string[]).includes(value);
}
