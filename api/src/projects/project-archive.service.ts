// Archiving takes a closed project out of everyday lists (the projects page, the pickers,
// interviewers' devices) and makes it read-only; restoring puts it back, closed. It is a
// column (projects.archived_at), not a stage: the stage stays "closed", so interviews a
// device still holds for it sync as they would for any closed project: accepted and flagged.
import { BadRequestException, ConflictException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import type { ProjectRow } from '../database/tables.js';
import { ProjectAccess } from './project-access.service.js';
import { projectSummary, type ProjectSummary } from './projects.service.js';

@Injectable()
export class ProjectArchive {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
  ) {}

  async archive(user: AuthUser, id: string): Promise<ProjectSummary> {
    const project = await this.access.find(user, id);
    if (project.archived_at) throw new ConflictException('This project is already archived.');
    if (project.status !== 'closed') {
      const message = 'Only a closed project can be archived: close fieldwork first.';
      throw new BadRequestException({ message, fields: [{ field: 'status', message }] });
    }
    return this.set(id, this.db.fn.now());
  }

  async restore(user: AuthUser, id: string): Promise<ProjectSummary> {
    const project = await this.access.find(user, id);
    if (!project.archived_at) throw new ConflictException('This project is not archived.');
    return this.set(id, null);
  }

  private async set(id: string, archivedAt: Knex.Raw | null): Promise<ProjectSummary> {
    const [row] = await this.db('projects').where({ id }).update({ archived_at: archivedAt as unknown as Date | null }).returning('*');
    return projectSummary(row as ProjectRow);
  }
}
