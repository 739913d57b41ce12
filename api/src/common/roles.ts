export const ROLES = ['admin', 'lead', 'supervisor', 'interviewer', 'client'] as const;
export type Role = (typeof ROLES)[number];

/** The signed-in user as every guarded route sees it. */
export interface AuthUser {
  id: string;
  organisationId: string;
  role: Role;
  email: string;
  name: string;
}
