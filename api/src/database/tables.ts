// Row types of every table, in one place: Knex checks queries against them, so a
// renamed column breaks the build instead of a request.
import type { Role } from '../common/roles.js';

export interface OrganisationRow {
  id: string;
  name: string;
  created_at: Date;
}

export interface UserRow {
  id: string;
  organisation_id: string;
  email: string;
  name: string;
  role: Role;
  password_hash: string;
  active: boolean;
  created_at: Date;
  updated_at: Date;
}

export interface RefreshTokenRow {
  id: string;
  family_id: string;
  user_id: string;
  token_hash: string;
  expires_at: Date;
  replaced_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

export interface ProjectRow {
  id: string;
  organisation_id: string;
  name: string;
  topic: string;
  field_start: string | null;
  field_end: string | null;
  target_size: number;
  status: 'setup' | 'fieldwork' | 'closed';
  created_at: Date;
}

export interface ProjectMemberRow {
  project_id: string;
  user_id: string;
  created_at: Date;
}

export interface ThrottleHitRow {
  key: string;
  hits: number;
  expires_at: Date;
}

declare module 'knex/types/tables.js' {
  interface Tables {
    organisations: OrganisationRow;
    users: UserRow;
    refresh_tokens: RefreshTokenRow;
    projects: ProjectRow;
    project_members: ProjectMemberRow;
    throttle_hits: ThrottleHitRow;
  }
}
