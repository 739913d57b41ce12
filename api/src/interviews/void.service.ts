// A supervisor's (or lead's) void of one interview, outside the sync: the same applyVoid as
// an interviewer's void item, under the project's row lock like a sync batch.
import { Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { applyVoid } from './void-items.js';

export interface VoidResult {
  id: string;
  status: 'voided' | 'duplicate';
}

@Injectable()
export class VoidService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
  ) {}

  async voidOne(user: AuthUser, projectId: string, interviewId: string, reason: string): Promise<VoidResult> {
    await this.access.find(user, projectId);
    const id = interviewId.toLowerCase();
    const outcome = await this.db.transaction(async (trx) => {
      await trx('projects').where({ id: projectId }).forUpdate().first('id');
      return applyVoid(trx, user, projectId, { id, reason });
    });
    if (outcome.status === 'rejected') throw new NotFoundException(`Interview not found: ${outcome.reason}`);
    return { id, status: outcome.status };
  }
}
