import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import type { ProjectRow } from '../database/tables.js';

export interface ProjectSummary {
  id: string;
  name: string;
  topic: string;
  fieldStart: string | null;
  fieldEnd: string | null;
  targetSize: number;
  status: ProjectRow['status'];
}

function summary(row: ProjectRow): ProjectSummary {
  return {
    id: row.id,
    name: row.name,
    topic: row.topic,
    fieldStart: row.field_start,
    fieldEnd: row.field_end,
    targetSize: row.target_size,
    status: row.status,
  };
}

/** Interviewers and clients see only the projects they are members of. */
const MEMBERS_ONLY: ReadonlySet<AuthUser['role']> = new Set(['interviewer', 'client']);

@Injectable()
export class ProjectsService {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  private visible(user: AuthUser) {
    const query = this.db('projects').where('projects.organisation_id', user.organisationId);
    if (MEMBERS_ONLY.has(user.role)) {
      query.whereExists(
        this.db('project_members')
          .whereRaw('project_members.project_id = projects.id')
          .where('project_members.user_id', user.id),
      );
    }
    return query;
  }

  async list(user: AuthUser): Promise<ProjectSummary[]> {
    const rows = await this.visible(user).select('projects.*').orderBy('projects.created_at', 'desc');
    return rows.map(summary);
  }

  async get(user: AuthUser, id: string): Promise<ProjectSummary> {
    const row = await this.visible(user).where('projects.id', id).first('projects.*');
    if (!row) throw new NotFoundException('No such project');
    return summary(row);
  }
}
