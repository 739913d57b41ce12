// Per-interviewer assignments: a lead or supervisor gives an interviewer on a project's team
// a number of completes to reach and, optionally, quota cells to work. Stored in
// interviewer_assignments (one row per project and interviewer, removed with the team
// membership). Cells that later disappear (targets changed) are left out when read.
import { BadRequestException, Inject, Injectable, NotFoundException } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import type { SetAssignmentDto } from './dto/set-assignment.dto.js';

export interface Assignment {
  userId: string;
  name: string;
  target: number;
  cellIds: string[];
  /** The interviewer's counted completes on the project. */
  completes: number;
  updatedAt: string;
}

const badRequest = (field: string, message: string) => new BadRequestException({ message, fields: [{ field, message }] });

@Injectable()
export class AssignmentsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
  ) {}

  async list(user: AuthUser, projectId: string): Promise<Assignment[]> {
    await this.access.find(user, projectId);
    return this.read(projectId);
  }

  async set(user: AuthUser, projectId: string, userId: string, dto: SetAssignmentDto): Promise<Assignment> {
    await this.access.findEditable(user, projectId);
    await this.checkInterviewer(projectId, userId);
    const asked = [...new Set((dto.cellIds ?? []).map((id) => id.toLowerCase()))];
    // Kept in the cells' own order, whatever the order sent.
    const cellIds = asked.length
      ? (await this.db('quota_cells').where({ project_id: projectId }).whereIn('id', asked).orderBy('position').select('id')).map((r) => r.id)
      : [];
    const unknown = asked.find((id) => !cellIds.includes(id));
    if (unknown) throw badRequest('cellIds', `${unknown} is not a quota cell of this project`);
    await this.db('interviewer_assignments')
      .insert({ project_id: projectId, user_id: userId, target: dto.target, cell_ids: cellIds, updated_by: user.id, updated_at: this.db.fn.now() as unknown as Date })
      .onConflict(['project_id', 'user_id'])
      .merge(['target', 'cell_ids', 'updated_by', 'updated_at']);
    const [assignment] = await this.read(projectId, userId);
    return assignment!;
  }

  async clear(user: AuthUser, projectId: string, userId: string): Promise<void> {
    await this.access.findEditable(user, projectId);
    const removed = await this.db('interviewer_assignments').where({ project_id: projectId, user_id: userId }).delete();
    if (removed === 0) throw new NotFoundException('This interviewer has no assignment on this project');
  }

  /** Only an active interviewer on the project's team can be given an assignment. */
  private async checkInterviewer(projectId: string, userId: string): Promise<void> {
    const member = await this.db('project_members')
      .join('users', 'users.id', 'project_members.user_id')
      .where('project_members.project_id', projectId)
      .where('project_members.user_id', userId)
      .first('users.role', 'users.active');
    if (!member || member.role !== 'interviewer' || !member.active) {
      throw badRequest('userId', 'Assignments are for interviewers on this project’s team: add the person to the team as an interviewer first');
    }
  }

  private async read(projectId: string, userId?: string): Promise<Assignment[]> {
    const rows = await this.db('interviewer_assignments as a')
      .join('users as u', 'u.id', 'a.user_id')
      .where('a.project_id', projectId)
      .modify((q) => (userId ? q.where('a.user_id', userId) : q))
      .orderBy('u.name')
      .select(
        'a.user_id',
        'u.name',
        'a.target',
        this.db.raw('ARRAY(SELECT c.id FROM quota_cells c WHERE c.project_id = a.project_id AND c.id = ANY(a.cell_ids) ORDER BY c.position) AS cell_ids'),
        this.db.raw(
          'COALESCE((SELECT SUM(d.n) FROM interviewer_day_counts d WHERE d.project_id = a.project_id AND d.interviewer_id = a.user_id), 0)::int AS completes',
        ),
        'a.updated_at',
      );
    return (rows as { user_id: string; name: string; target: number; cell_ids: string[]; completes: number; updated_at: Date }[]).map((r) => ({
      userId: r.user_id,
      name: r.name,
      target: r.target,
      cellIds: r.cell_ids,
      completes: r.completes,
      updatedAt: r.updated_at.toISOString(),
    }));
  }
}
