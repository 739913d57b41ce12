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
  headline_question: string;
  /** IANA time zone of the fieldwork: field days and "today" are counted in it. */
  time_zone: string;
  targets_updated_at: Date | null;
  created_at: Date;
}

export interface QuotaVariableRow {
  id: string;
  project_id: string;
  name: string;
  position: number;
  interlocked: boolean;
  retired: boolean;
}

export interface QuotaCategoryRow {
  id: string;
  variable_id: string;
  project_id: string;
  label: string;
  position: number;
  share: number;
  retired: boolean;
}

export interface QuotaCellRow {
  id: string;
  project_id: string;
  kind: 'interlocked' | 'margin';
  category_ids: string[];
  label: string;
  position: number;
  target: number;
  closed_at: Date | null;
  closed_by: string | null;
}

export const DISPOSITIONS = ['complete', 'partial', 'refusal', 'non_contact', 'other', 'not_eligible'] as const;
export type Disposition = (typeof DISPOSITIONS)[number];

export interface InterviewRow {
  id: string;
  project_id: string;
  interviewer_id: string;
  disposition: Disposition;
  category_ids: string[];
  headline_answer: boolean | null;
  started_at: Date;
  ended_at: Date;
  field_day: string;
  received_at: Date;
  over_quota: boolean;
  review_status: 'pending' | 'approved' | 'rejected';
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

/** Counted interviews per project and combination of categories (kept by triggers). */
export interface InterviewCountRow {
  project_id: string;
  category_ids: string[];
  n: number;
  yes: number;
  over_quota: number;
}

declare module 'knex/types/tables.js' {
  interface Tables {
    organisations: OrganisationRow;
    users: UserRow;
    refresh_tokens: RefreshTokenRow;
    projects: ProjectRow;
    project_members: ProjectMemberRow;
    throttle_hits: ThrottleHitRow;
    quota_variables: QuotaVariableRow;
    quota_categories: QuotaCategoryRow;
    quota_cells: QuotaCellRow;
    interviews: InterviewRow;
    interview_counts: InterviewCountRow;
  }
}
