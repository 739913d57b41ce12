import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import type { Role } from '../common/roles.js';
import type { UserRow } from '../database/tables.js';

export interface UserProfile {
  id: string;
  email: string;
  name: string;
  role: Role;
  organisation: { id: string; name: string };
}

export interface UserSummary {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** invited: no password set yet; disabled: may not sign in; active: may. */
  status: 'invited' | 'active' | 'disabled';
  createdAt: string;
}

export function summary(row: UserRow): UserSummary {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    active: row.active,
    status: !row.active ? 'disabled' : row.password_hash === null ? 'invited' : 'active',
    createdAt: row.created_at.toISOString(),
  };
}

@Injectable()
export class UsersRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  findActiveByEmail(email: string): Promise<UserRow | undefined> {
    return this.db('users').whereRaw('lower(email) = lower(?)', [email]).where({ active: true }).first();
  }

  async findProfile(id: string): Promise<UserProfile | undefined> {
    const row = await this.db('users')
      .join('organisations', 'organisations.id', 'users.organisation_id')
      .where('users.id', id)
      .where('users.active', true)
      .first<{ id: string; email: string; name: string; role: Role; organisation_id: string; organisation_name: string }>(
        'users.id',
        'users.email',
        'users.name',
        'users.role',
        'users.organisation_id',
        'organisations.name as organisation_name',
      );
    if (!row) return undefined;
    return {
      id: row.id,
      email: row.email,
      name: row.name,
      role: row.role,
      organisation: { id: row.organisation_id, name: row.organisation_name },
    };
  }

  async listInOrganisation(organisationId: string): Promise<UserSummary[]> {
    const rows = await this.db('users').where({ organisation_id: organisationId }).orderBy(['role', 'name']);
    return rows.map(summary);
  }

  async findInOrganisation(organisationId: string, id: string): Promise<UserSummary | undefined> {
    const row = await this.db('users').where({ organisation_id: organisationId, id }).first();
    return row ? summary(row) : undefined;
  }

  async emailTaken(email: string): Promise<boolean> {
    return Boolean(await this.db('users').whereRaw('lower(email) = lower(?)', [email]).first('id'));
  }

  async create(user: Pick<UserRow, 'organisation_id' | 'email' | 'name' | 'role' | 'password_hash'>): Promise<UserSummary> {
    const [row] = await this.db('users').insert(user).returning('*');
    return summary(row as UserRow);
  }
}
