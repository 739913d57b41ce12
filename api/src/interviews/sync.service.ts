// Receives batches of interviews from devices. The device's UUID (compared in lower case)
// is the row's key, so a batch sent twice, or two devices racing, store each interview
// once: later copies from the same interviewer are answered "duplicate", an id held by
// another interviewer or project "rejected", never a false "accepted". Each item is checked
// on its own (item-check.ts) and stored through a guarded insert, so one bad item is only
// that item's rejection. Batches for one project are serialised by a row lock on the
// project, so over-quota marking sees every earlier interview. Interviews the project did
// not expect (closed project, outside the field dates) are kept and flagged (flags.ts).
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import type { AuthUser } from '../common/roles.js';
import { KNEX } from '../database/database.constants.js';
import { isDatabaseUnavailable } from '../common/database-unavailable.js';
import type { ProjectRow } from '../database/tables.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { QualityScheduler } from '../quality/quality-jobs.js';
import { loadAllTargets, type ActiveTargets } from '../quotas/cell-allocator.js';
import { CellsService, withCounts, type CellView } from '../quotas/cells.service.js';
import { flagsOnArrival, type FlagCode } from './flags.js';
import { insertAll, insertGuarded, type NewInterview } from './guarded-insert.js';
import { checkCategories, checkItem, type CheckedItem } from './item-check.js';
import { counted } from './counted.js';
import { selectOnArrival } from '../backchecks/select-on-arrival.js';
import { applyVoid, checkVoid, isVoidItem, type VoidCheck } from './void-items.js';

export type SyncResult =
  | { id: string | null; status: 'accepted'; overQuota: boolean; overQuotaCells: string[]; flags: FlagCode[] }
  | { id: string | null; status: 'duplicate' }
  | { id: string | null; status: 'voided' }
  | { id: string | null; status: 'rejected'; reason: string };

export interface SyncReply {
  /** One result per item, in the order sent; ids in canonical lower case. */
  results: SyncResult[];
  accepted: number;
  duplicates: number;
  /** Void items that voided an interview (void-items.ts); voiding one again is a duplicate. */
  voided: number;
  rejected: number;
  cells: CellView[];
}

/** The calendar day (YYYY-MM-DD) of a moment in the project's time zone. */
export function fieldDayIn(timeZone: string): (moment: Date | string) => string {
  const format = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
  return (moment) => format.format(typeof moment === 'string' ? new Date(moment) : moment);
}

const TAKEN = 'another interview already has this id; keep it on the device and tell your supervisor';
const REFUSED = 'the server could not store this interview; keep it on the device and tell your supervisor';

interface ReadBeforeLock {
  checked: ReturnType<typeof checkItem>[];
  /** Void items by their place in the batch (their `checked` entry is a stand-in). */
  voids: Map<number, VoidCheck>;
  /** Every variable and category the project ever had (retired ones too). */
  targets: ActiveTargets;
  /** Ids of the batch already stored, with whose they are. */
  known: Map<string, { id: string; project_id: string; interviewer_id: string }>;
}

/** What an interview says, to tell a repeat of the same interview from a different one with its id. */
const fingerprint = (item: CheckedItem) =>
  JSON.stringify([item.disposition, Object.entries(item.categories).sort(), item.headlineAnswer ?? null, item.eligibilityKnown, +item.startedAt, +item.endedAt]);

@Injectable()
export class SyncService {
  constructor(
    @Inject(KNEX) private readonly db: Knex,
    private readonly access: ProjectAccess,
    private readonly cells: CellsService,
    private readonly quality: QualityScheduler,
  ) {}

  async sync(user: AuthUser, projectId: string, batch: unknown[]): Promise<SyncReply> {
    await this.access.findForInterviewer(user, projectId);
    const voids = new Map<number, VoidCheck>();
    const checked = batch.map((raw, index) => {
      if (!isVoidItem(raw)) return checkItem(raw);
      voids.set(index, checkVoid(raw));
      return { ok: false as const, id: null, reason: 'void' };
    });
    // The project's lock is held for as few round trips as possible (lock, cells, insert,
    // commit). The targets and the ids already stored are read before it, side by side: an id
    // stored meanwhile is caught after the insert, and a target changed meanwhile is the
    // office changing something while the device was out, which never refuses an interview.
    const ids = [...new Set(checked.flatMap((c) => (c.ok ? [c.item.id] : [])))];
    const [targets, existing] = await Promise.all([
      loadAllTargets(this.db, projectId),
      ids.length ? this.db('interviews').whereIn('id', ids).select('id', 'project_id', 'interviewer_id') : Promise.resolve([]),
    ]);
    const known = new Map(existing.map((r) => [r.id, r]));
    // One plain insert in the common case; only if the database refuses it, the whole batch
    // again, guarded row by row.
    const attempt = (guarded: boolean) =>
      this.db.transaction(async (trx) => {
        // The lock also gives the project's status and field dates as they are now.
        const project = (await trx('projects').where({ id: projectId }).forUpdate().first()) as ProjectRow;
        return this.store(trx, user, project, { checked, voids, targets, known }, guarded);
      });
    let stored: { results: SyncResult[]; cells: CellView[] };
    try {
      stored = await attempt(false);
    } catch (error) {
      if (isDatabaseUnavailable(error)) throw error;
      stored = await attempt(true);
    }
    const { results, cells } = stored;
    const count = (status: SyncResult['status']) => results.filter((r) => r.status === status).length;
    // New or voided interviews move the median, the overlaps and the answer tests: check again.
    if (count('accepted') + count('voided') > 0) this.quality.queue(projectId);
    return { results, accepted: count('accepted'), duplicates: count('duplicate'), voided: count('voided'), rejected: count('rejected'), cells };
  }

  private async store(trx: Knex.Transaction, user: AuthUser, project: ProjectRow, read: ReadBeforeLock, guarded: boolean) {
    const { checked, targets, known: existing } = read;
    const fieldDay = fieldDayIn(project.time_zone);
    const flagContext = { status: project.status, fieldStart: project.field_start, fieldEnd: project.field_end };
    const ours = (row: { project_id: string; interviewer_id: string }) => row.project_id === project.id && row.interviewer_id === user.id;
    // Read under the lock: the reply's cells are these plus what this batch stored (no read after commit).
    const before = await this.cells.cellCounts(project.id, trx);
    const cells = before.map((cell) => ({ ...cell }));
    const firstCopy = new Map<string, { index: number; fingerprint: string }>();
    const repeats = new Map<number, number>();
    const rows: NewInterview[] = [];
    const references = new Map<string, string>();

    const out: SyncResult[] = checked.map((c, index): SyncResult => {
      if (!c.ok) return { id: c.id, status: 'rejected', reason: c.reason };
      const { item } = c;
      const prior = existing.get(item.id);
      if (prior) return ours(prior) ? { id: item.id, status: 'duplicate' } : { id: item.id, status: 'rejected', reason: TAKEN };
      const first = firstCopy.get(item.id);
      if (first) {
        if (first.fingerprint !== fingerprint(item)) return { id: item.id, status: 'rejected', reason: 'another interview in this batch has the same id' };
        repeats.set(index, first.index);
        return { id: item.id, status: 'duplicate' };
      }
      const checkedCategories = checkCategories(item, targets);
      if ('reason' in checkedCategories) return { id: item.id, status: 'rejected', reason: checkedCategories.reason };
      const categories = checkedCategories.ids;
      firstCopy.set(item.id, { index, fingerprint: fingerprint(item) });
      let fullCells: string[] = [];
      if (counted({ disposition: item.disposition })) {
        const mine = cells.filter((cell) => cell.categoryIds.every((id) => categories.includes(id)));
        fullCells = mine.filter((cell) => cell.status === 'closed' || cell.achieved >= cell.target).map((cell) => cell.id);
        for (const cell of mine) cell.achieved += 1;
      }
      const overQuota = fullCells.length > 0;
      const day = fieldDay(item.endedAt);
      const flags = [...flagsOnArrival(flagContext, day), ...checkedCategories.flags];
      rows.push({
        id: item.id,
        project_id: project.id,
        interviewer_id: user.id,
        disposition: item.disposition,
        category_ids: categories,
        headline_answer: item.disposition === 'complete' ? (item.headlineAnswer ?? null) : null,
        eligibility_known: item.eligibilityKnown,
        started_at: item.startedAt,
        ended_at: item.endedAt,
        field_day: day,
        over_quota: overQuota,
        over_quota_cells: fullCells,
        flags,
      });
      if (item.respondentReference) references.set(item.id, item.respondentReference);
      return { id: item.id, status: 'accepted', overQuota, overQuotaCells: fullCells, flags };
    });

    const { stored, refused } = await (guarded ? insertGuarded : insertAll)(trx, rows);
    const missing = rows.filter((r) => !stored.has(r.id) && !refused.has(r.id)).map((r) => r.id);
    // Ids another batch stored after our look-up (another project's batch is not serialised with ours).
    const takenMeanwhile = new Map(
      missing.length ? (await trx('interviews').whereIn('id', missing).select('id', 'project_id', 'interviewer_id')).map((r) => [r.id, r]) : [],
    );
    out.forEach((result, index) => {
      if (result.status !== 'accepted' || !result.id || stored.has(result.id)) return;
      const taken = takenMeanwhile.get(result.id);
      out[index] = taken && ours(taken) ? { id: result.id, status: 'duplicate' } : { id: result.id, status: 'rejected', reason: taken ? TAKEN : REFUSED };
    });
    // A repeat inside the batch shares the fate of its first copy: never "duplicate" of something not stored.
    for (const [index, first] of repeats) if (out[first]!.status !== 'accepted') out[index] = out[first]!;
    // Back-checks are decided once, for the completes this batch stored (references of others are dropped).
    const completes = rows.filter((r) => r.disposition === 'complete' && stored.has(r.id));
    await selectOnArrival(trx, project, completes.map((r) => ({ id: r.id, interviewerId: r.interviewer_id, respondentReference: references.get(r.id) })));
    // Voids after the new interviews, one by one (a device sends few); each is its item's result.
    let anyVoided = false;
    for (const [index, check] of read.voids) {
      if (!check.ok) {
        out[index] = { id: check.id, status: 'rejected', reason: check.reason };
        continue;
      }
      const outcome = await applyVoid(trx, user, project.id, check.item);
      anyVoided ||= outcome.status === 'voided';
      out[index] = { id: check.item.id, ...outcome };
    }
    // A void moves counts the batch did not add: read them again (the trigger has run) under the lock.
    const after = anyVoided ? await this.cells.cellCounts(project.id, trx) : cellsAfter(before, rows.filter((r) => stored.has(r.id)));
    return { results: out, cells: after };
  }
}

/** The cells after this batch: the counts read under the lock plus the completes it stored. */
function cellsAfter(before: CellView[], stored: NewInterview[]): CellView[] {
  const completes = stored.filter((row) => counted(row));
  return before.map((cell) => {
    const mine = completes.filter((row) => cell.categoryIds.every((id) => row.category_ids.includes(id)));
    return withCounts(cell, cell.achieved + mine.length, cell.overQuota + mine.filter((row) => row.over_quota_cells.includes(cell.id)).length);
  });
}
