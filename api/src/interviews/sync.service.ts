// Receives batches of interviews from devices. The device's UUID is the row's key, so a
// batch sent twice, or two devices racing, store each interview once: later copies are
// answered "duplicate". Batches for one project are serialised by a row lock on the
// project, so over-quota marking sees every earlier interview.
import { Inject, Injectable } from '@nestjs/common';
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import type { InterviewRow } from '../database/tables.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { loadActiveTargets, type ActiveTargets } from '../quotas/cell-allocator.js';
import { CellsService, type CellView } from '../quotas/cells.service.js';
import { InterviewItemDto } from './dto/sync.dto.js';

export type SyncResult =
  | { id: string | null; status: 'accepted'; overQuota: boolean }
  | { id: string | null; status: 'duplicate' }
  | { id: string | null; status: 'rejected'; reason: string };

export interface SyncReply {
  results: SyncResult[];
  accepted: number;
  duplicates: number;
  rejected: number;
  cells: CellView[];
}

/** The calendar day (YYYY-MM-DD) of a moment in the project's time zone. */
export function fieldDayIn(timeZone: string): (moment: string) => string {
  const format = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
  return (moment) => format.format(new Date(moment));
}

type Checked = { ok: true; item: InterviewItemDto } | { ok: false; id: string | null; reason: string };

function checkShape(raw: unknown): Checked {
  const id = typeof (raw as { id?: unknown })?.id === 'string' ? (raw as { id: string }).id : null;
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) return { ok: false, id, reason: 'not an interview object' };
  const item = plainToInstance(InterviewItemDto, raw);
  const errors = validateSync(item, { whitelist: true, forbidNonWhitelisted: true });
  if (errors.length) {
    const reason = errors.flatMap((e) => Object.values(e.constraints ?? {})).join('; ');
    return { ok: false, id, reason };
  }
  if (Date.parse(item.endedAt) < Date.parse(item.startedAt)) return { ok: false, id, reason: 'endedAt is before startedAt' };
  return { ok: true, item };
}

/** Category ids of a complete, one per active variable, in variable order; or a reason. */
function categoryIds(item: InterviewItemDto, targets: ActiveTargets): string[] | string {
  const given = item.categories ?? {};
  const known = new Set(targets.variables.map((v) => v.id));
  const unknown = Object.keys(given).find((k) => !known.has(k));
  if (unknown) return `unknown quota variable ${unknown}`;
  const ids: string[] = [];
  for (const v of targets.variables) {
    const value = given[v.id];
    if (value === undefined || value === null) {
      if (item.disposition === 'complete') return `${v.name}: no category given`;
      continue;
    }
    const category = v.categories.find((c) => c.id === value);
    if (!category) return `${v.name}: unknown category ${String(value)}`;
    ids.push(category.id);
  }
  return ids;
}

@Injectable()
export class SyncService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
    private readonly cells: CellsService,
  ) {}

  async sync(user: AuthUser, projectId: string, batch: unknown[]): Promise<SyncReply> {
    const project = await this.access.findForInterviewer(user, projectId);
    const fieldDay = fieldDayIn(project.time_zone);
    const checked = batch.map(checkShape);

    const results = await this.db.transaction(async (trx) => {
      await trx('projects').where({ id: projectId }).forUpdate().first('id');
      const targets = await loadActiveTargets(trx, projectId);
      const ids = checked.flatMap((c) => (c.ok ? [c.item.id] : []));
      const existing = new Map(
        (await trx('interviews').whereIn('id', ids).select('id', 'project_id', 'interviewer_id')).map((r) => [r.id, r]),
      );
      const cells = await this.cells.cellCounts(projectId, trx);
      const seen = new Set<string>();
      const rows: Omit<InterviewRow, 'received_at' | 'review_status' | 'counted'>[] = [];

      const out: SyncResult[] = checked.map((c) => {
        if (!c.ok) return { id: c.id, status: 'rejected', reason: c.reason };
        const { item } = c;
        const prior = existing.get(item.id);
        if (prior || seen.has(item.id)) {
          if (prior && (prior.project_id !== projectId || prior.interviewer_id !== user.id)) {
            return { id: item.id, status: 'rejected', reason: 'this id belongs to another interview' };
          }
          return { id: item.id, status: 'duplicate' };
        }
        const categories = categoryIds(item, targets);
        if (typeof categories === 'string') return { id: item.id, status: 'rejected', reason: categories };
        if (item.disposition === 'complete' && item.headlineAnswer === undefined) {
          return { id: item.id, status: 'rejected', reason: 'headlineAnswer is missing' };
        }
        seen.add(item.id);
        let overQuota = false;
        if (item.disposition === 'complete') {
          const mine = cells.filter((cell) => cell.categoryIds.every((id) => categories.includes(id)));
          overQuota = mine.some((cell) => cell.status === 'closed' || cell.achieved >= cell.target);
          for (const cell of mine) cell.achieved += 1;
        }
        rows.push({
          id: item.id,
          project_id: projectId,
          interviewer_id: user.id,
          disposition: item.disposition,
          category_ids: categories,
          headline_answer: item.disposition === 'complete' ? (item.headlineAnswer as boolean) : null,
          started_at: new Date(item.startedAt),
          ended_at: new Date(item.endedAt),
          field_day: fieldDay(item.endedAt),
          over_quota: overQuota,
        });
        return { id: item.id, status: 'accepted', overQuota };
      });
      if (rows.length) await trx('interviews').insert(rows).onConflict('id').ignore();
      return out;
    });

    const count = (status: SyncResult['status']) => results.filter((r) => r.status === status).length;
    return {
      results,
      accepted: count('accepted'),
      duplicates: count('duplicate'),
      rejected: count('rejected'),
      cells: await this.cells.cellCounts(projectId),
    };
  }
}
