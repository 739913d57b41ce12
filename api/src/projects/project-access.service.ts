import { ConflictException, ForbiddenException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import type { ProjectRow } from '../database/tables.js';

/** Interviewers and clients see only the projects they are members of. */
const MEMBERS_ONLY: ReadonlySet<AuthUser['role']> = new Set(['interviewer', 'client']);

/**
 * The one place that decides which projects a user may see: everything in their own
 * organisation for office roles, assigned projects for interviewers and clients.
 * Anything else is answered 404, as if it did not exist.
 */
@Injectable()
export class ProjectAccess {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  visibleProjects(user: AuthUser) {
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

  async find(user: AuthUser, projectId: string): Promise<ProjectRow> {
    const row = await this.visibleProjects(user).where('projects.id', projectId).first('projects.*');
    if (!row) throw new NotFoundException('No such project');
    return row;
  }

  /** As `find`, for changing the project: an archived project is read-only until it is restored (409). */
  async findEditable(user: AuthUser, projectId: string): Promise<ProjectRow> {
    const row = await this.find(user, projectId);
    assertNotArchived(row);
    return row;
  }

  /** For logging interviews: the project must exist in the organisation and be assigned to the interviewer. */
  async findForInterviewer(user: AuthUser, projectId: string): Promise<ProjectRow> {
    // One round trip: the project and whether this interviewer is on its team.
    const row = (await this.db('projects')
      .where({ id: projectId, organisation_id: user.organisationId })
      .select('projects.*', this.db.raw('EXISTS (SELECT 1 FROM project_members m WHERE m.project_id = projects.id AND m.user_id = ?) AS is_member', [user.id]))
      .first()) as (ProjectRow & { is_member: boolean }) | undefined;
    if (!row) throw new NotFoundException('No such project');
    if (!row.is_member) throw new ForbiddenException('You are not assigned to this project; ask your supervisor to add you');
    const { is_member: _member, ...project } = row;
    return project;
  }
}

export const ARCHIVED_MESSAGE = 'This project is archived and read-only: restore it (it goes back to closed) before changing it.';

export function assertNotArchived(project: ProjectRow): void {
  if (project.archived_at) throw new ConflictException(ARCHIVED_MESSAGE);
}
