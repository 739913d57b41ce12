// Review decisions: approve, reject or reinstate one or many interviews, each recorded in the
// append-only audit trail (review_decisions: a trigger refuses UPDATE and DELETE). Changing
// review_status moves the trigger-kept counts, so the project's row is locked first, exactly
// as a sync batch does; decisions and batches of one project then take turns and never deadlock.
import { BadRequestException, ConflictException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import type { ReviewDecisionRow, ReviewStatus } from '../database/tables.js';
import { assertNotArchived, ProjectAccess } from '../projects/project-access.service.js';
import type { ReviewDecisionDto } from './dto/decision.dto.js';

type Action = ReviewDecisionRow['action'];

/** The status each action leads to, and the statuses it may start from. */
export const TRANSITIONS: Record<Action, { to: ReviewStatus; from: ReviewStatus[] }> = {
  approve: { to: 'approved', from: ['pending', 'rejected'] },
  reject: { to: 'rejected', from: ['pending', 'approved'] },
  reinstate: { to: 'pending', from: ['rejected'] },
};

export interface DecisionResult {
  action: Action;
  decided: number;
  interviews: { id: string; previousStatus: ReviewStatus; newStatus: ReviewStatus }[];
}

const listed = (ids: string[]) => (ids.length > 5 ? `${ids.slice(0, 5).join(', ')} and ${ids.length - 5} more` : ids.join(', '));

@Injectable()
export class ReviewDecisionsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
  ) {}

  async decide(user: AuthUser, projectId: string, dto: ReviewDecisionDto): Promise<DecisionResult> {
    if ((dto.interviewIds === undefined) === (dto.selection === undefined)) {
      throw new BadRequestException('Give either interviewIds or selection (an interviewer and a field day), not both or neither');
    }
    await this.access.findEditable(user, projectId);
    const { to, from } = TRANSITIONS[dto.action];
    return this.db.transaction(async (trx) => {
      const project = await trx('projects').where({ id: projectId }).forUpdate().first();
      assertNotArchived(project!);
      const chosen = trx('interviews').where('project_id', projectId).orderBy(['started_at', 'id']);
      if (dto.interviewIds) chosen.whereIn('id', [...new Set(dto.interviewIds.map((id) => id.toLowerCase()))]);
      else chosen.where({ interviewer_id: dto.selection!.interviewerId, field_day: dto.selection!.fieldDay });
      const rows = (await chosen.select('id', 'review_status')) as { id: string; review_status: ReviewStatus }[];
      let targets = rows;
      if (dto.interviewIds) {
        const found = new Set(rows.map((r) => r.id));
        const missing = [...new Set(dto.interviewIds.map((id) => id.toLowerCase()))].filter((id) => !found.has(id));
        if (missing.length) throw new BadRequestException(`Not interviews of this project: ${listed(missing)}`);
        const wrong = rows.filter((r) => !from.includes(r.review_status));
        if (wrong.length) {
          const statuses = [...new Set(wrong.map((r) => r.review_status))].join(' or ');
          const which = wrong.length === 1 ? 'this interview: it is' : `${wrong.length} of these interviews: they are`;
          throw new ConflictException(`Cannot ${dto.action} ${which} ${statuses} (${dto.action} applies to ${from.join(' or ')} interviews): ${listed(wrong.map((r) => r.id))}`);
        }
      } else {
        // All of one interviewer's day: those the action applies to; the others stay as they are.
        targets = rows.filter((r) => from.includes(r.review_status));
        if (!targets.length) {
          throw new ConflictException(rows.length
            ? `None of this interviewer's ${rows.length} interviews on ${dto.selection!.fieldDay} can be ${dto.action === 'reinstate' ? 'reinstated (none of them is rejected)' : `${dto.action}d (they are already ${to})`}`
            : `This interviewer has no interviews on ${dto.selection!.fieldDay} in this project`);
        }
      }
      const ids = targets.map((r) => r.id);
      await trx('interviews').where('project_id', projectId).whereIn('id', ids).update({ review_status: to });
      await trx('review_decisions').insert(targets.map((r) => ({
        project_id: projectId, interview_id: r.id, action: dto.action, previous_status: r.review_status, new_status: to, reason: dto.reason, decided_by: user.id,
      })));
      return { action: dto.action, decided: targets.length, interviews: targets.map((r) => ({ id: r.id, previousStatus: r.review_status, newStatus: to })) };
    });
  }
}
