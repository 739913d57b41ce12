import { BadRequestException, Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import { copyProject } from './project-copy.js';
import type { ProjectRow } from '../database/tables.js';
import type { CreateProjectDto } from './dto/create-project.dto.js';
import type { UpdateProjectDto } from './dto/update-project.dto.js';
import { CellAllocator } from '../quotas/cell-allocator.js';
import { ProjectAccess } from './project-access.service.js';
import { TimeZones } from './time-zones.js';
import { ownProgress, type OwnProgress } from './own-progress.js';
import { QualityScheduler } from '../quality/quality-jobs.js';

export interface ProjectSummary {
  id: string;
  name: string;
  topic: string;
  fieldStart: string | null;
  fieldEnd: string | null;
  targetSize: number;
  status: ProjectRow['status'];
  headlineQuestion: string;
  timeZone: string;
  /** When it was archived; null while it is not. */
  archivedAt: string | null;
}

/** A project as GET /api/projects lists it: for an interviewer, with their own progress. */
export interface ProjectListItem extends ProjectSummary {
  mine: OwnProgress | null;
}

export interface ProjectMember {
  id: string;
  name: string;
  email: string;
  role: AuthUser['role'];
}

export function projectSummary(row: ProjectRow): ProjectSummary {
  return {
    id: row.id,
    name: row.name,
    topic: row.topic,
    fieldStart: row.field_start,
    fieldEnd: row.field_end,
    targetSize: row.target_size,
    status: row.status,
    headlineQuestion: row.headline_question,
    timeZone: row.time_zone,
    archivedAt: row.archived_at ? row.archived_at.toISOString() : null,
  };
}

function checkDates(start?: string | null, end?: string | null): void {
  if (start && end && start > end) {
    throw new BadRequestException({
      message: 'fieldEnd must not be before fieldStart',
      fields: [{ field: 'fieldEnd', message: 'must not be before fieldStart' }],
    });
  }
}

@Injectable()
export class ProjectsService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
    private readonly cells: CellAllocator,
    private readonly zones: TimeZones,
    private readonly quality: QualityScheduler,
  ) {}

  /** Archived projects are left out unless asked for, then they are all that is listed. */
  async list(user: AuthUser, archived = false): Promise<ProjectListItem[]> {
    const rows = await this.access
      .visibleProjects(user)
      .where((q) => (archived ? q.whereNotNull('projects.archived_at') : q.whereNull('projects.archived_at')))
      .select('projects.*')
      .orderBy('projects.created_at', 'desc');
    const mine = user.role === 'interviewer' ? await ownProgress(this.db, user.id, rows.map((r) => r.id)) : new Map<string, OwnProgress>();
    return rows.map((row) => ({ ...projectSummary(row), mine: mine.get(row.id) ?? null }));
  }

  async get(user: AuthUser, id: string): Promise<ProjectSummary> {
    return projectSummary(await this.access.find(user, id));
  }

  async create(user: AuthUser, dto: CreateProjectDto): Promise<ProjectSummary> {
    checkDates(dto.fieldStart, dto.fieldEnd);
    await this.zones.check(dto.timeZone);
    const [row] = await this.db('projects')
      .insert({
        organisation_id: user.organisationId,
        name: dto.name.trim(),
        topic: dto.topic?.trim() ?? '',
        field_start: dto.fieldStart,
        field_end: dto.fieldEnd,
        target_size: dto.targetSize,
        headline_question: dto.headlineQuestion.trim(),
        time_zone: dto.timeZone ?? 'UTC',
        status: 'setup',
      })
      .returning('*');
    return projectSummary(row as ProjectRow);
  }

  /** A new target size recomputes the cell targets; a new time zone re-dates the field days. */
  async update(user: AuthUser, id: string, dto: UpdateProjectDto): Promise<ProjectSummary> {
    const current = await this.access.findEditable(user, id);
    checkDates(dto.fieldStart ?? current.field_start, dto.fieldEnd ?? current.field_end);
    await this.zones.check(dto.timeZone);
    const changes: Partial<ProjectRow> = {};
    if (dto.name !== undefined) changes.name = dto.name.trim();
    if (dto.topic !== undefined) changes.topic = dto.topic.trim();
    if (dto.fieldStart !== undefined) changes.field_start = dto.fieldStart;
    if (dto.fieldEnd !== undefined) changes.field_end = dto.fieldEnd;
    if (dto.targetSize !== undefined) changes.target_size = dto.targetSize;
    if (dto.headlineQuestion !== undefined) changes.headline_question = dto.headlineQuestion.trim();
    if (dto.status !== undefined) changes.status = dto.status;
    if (changes.status === 'fieldwork' && current.status === 'setup') await this.checkReadyForFieldwork(current);
    if (dto.timeZone !== undefined) changes.time_zone = dto.timeZone;
    if (Object.keys(changes).length === 0) return projectSummary(current);
    const row = await this.db.transaction(async (trx) => {
      const [updated] = await trx('projects').where({ id }).update(changes).returning('*');
      if (changes.target_size !== undefined && changes.target_size !== current.target_size) {
        await this.cells.recompute(id, trx);
      }
      if (changes.time_zone !== undefined && changes.time_zone !== current.time_zone) {
        // Field days already recorded move to the new zone's calendar.
        await trx('interviews')
          .where({ project_id: id })
          .update({ field_day: trx.raw('(ended_at AT TIME ZONE ?)::date', [changes.time_zone]) });
      }
      return updated as ProjectRow;
    });
    // Out-of-hours starts are read in the project's time zone: the flags are computed again.
    if (changes.time_zone !== undefined || changes.field_start !== undefined || changes.field_end !== undefined) this.quality.queue(id);
    return projectSummary(row);
  }

  /** Fieldwork starts only with quota targets that give cells and at least one interviewer on the team. */
  private async checkReadyForFieldwork(project: ProjectRow): Promise<void> {
    const [cells, interviewers] = await Promise.all([
      this.db('quota_cells').where({ project_id: project.id }).where('target', '>', 0).count<{ count: string }[]>('* as count'),
      this.db('project_members')
        .join('users', 'users.id', 'project_members.user_id')
        .where('project_members.project_id', project.id)
        .where('users.role', 'interviewer')
        .where('users.active', true)
        .count<{ count: string }[]>('* as count'),
    ]);
    const missing: string[] = [];
    if (Number(cells[0]?.count ?? 0) === 0) missing.push('save quota targets');
    if (Number(interviewers[0]?.count ?? 0) === 0) missing.push('add at least one interviewer to the team');
    if (missing.length > 0) {
      const message = `Fieldwork cannot start yet: ${missing.join(' and ')}.`;
      throw new BadRequestException({ message, fields: [{ field: 'status', message }] });
    }
  }

  /** A new project in set-up with this one's facts, targets and team, and none of its interviews. */
  async duplicate(user: AuthUser, id: string): Promise<ProjectSummary> {
    const source = await this.access.find(user, id);
    return projectSummary(await this.db.transaction((trx) => copyProject(trx, source, this.cells)));
  }

  async members(user: AuthUser, id: string): Promise<ProjectMember[]> {
    await this.access.find(user, id);
    return this.db('project_members')
      .join('users', 'users.id', 'project_members.user_id')
      .where('project_members.project_id', id)
      .orderBy(['users.role', 'users.name'])
      .select('users.id', 'users.name', 'users.email', 'users.role');
  }

  /** Replaces the project's members; every id must be an active user of the organisation. */
  async setMembers(user: AuthUser, id: string, userIds: string[]): Promise<ProjectMember[]> {
    await this.access.findEditable(user, id);
    const unique = [...new Set(userIds)];
    const found = await this.db('users')
      .where({ organisation_id: user.organisationId, active: true })
      .whereIn('id', unique)
      .select('id');
    const known = new Set(found.map((r) => r.id));
    const missing = unique.filter((u) => !known.has(u));
    if (missing.length) {
      throw new BadRequestException({
        message: `Unknown user id ${missing[0]}`,
        fields: [{ field: 'userIds', message: `unknown user id ${missing[0]}` }],
      });
    }
    await this.db.transaction(async (trx) => {
      await trx('project_members').where({ project_id: id }).whereNotIn('user_id', unique).delete();
      if (unique.length) {
        await trx('project_members')
          .insert(unique.map((userId) => ({ project_id: id, user_id: userId })))
          .onConflict(['project_id', 'user_id'])
          .ignore();
      }
    });
    return this.members(user, id);
  }
}
