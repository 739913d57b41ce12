import type { Role } from '../lib/api-types';

export type { Role };
/** Every role the server knows (its Role enum); roleLabels must name each one. */
export const roles = ['admin', 'lead', 'supervisor', 'interviewer', 'client'] as const satisfies readonly Role[];

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
