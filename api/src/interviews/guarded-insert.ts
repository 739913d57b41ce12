// Stores a batch's new interviews. Every item was checked beforehand, so the database
// should refuse nothing, and the sync first tries one plain statement (insertAll). If the
// database still refuses it, the sync starts its transaction again and stores through
// insertGuarded: the batch in a savepoint, and if that is refused the rows one by one, each
// in its own savepoint, so only the refused ones are reported and one row can never fail
// the batch.
import { Logger } from '@nestjs/common';
import type { Knex } from 'knex';
import type { InterviewRow } from '../database/tables.js';

export type NewInterview = Omit<InterviewRow, 'received_at' | 'review_status' | 'counted' | 'voided_at' | 'voided_by' | 'void_reason' | 'eligibility_known'> & {
  eligibility_known?: boolean | null;
};

export interface InsertOutcome {
  /** Ids this statement stored. */
  stored: Set<string>;
  /** Ids the database refused. Any other id not stored was taken meanwhile by another batch. */
  refused: Set<string>;
}

const logger = new Logger('Sync');

/** Inserts in a savepoint (a transaction nested in a transaction); answers the ids stored. */
async function insert(trx: Knex.Transaction, rows: NewInterview[]): Promise<string[]> {
  const stored: { id: string }[] = [];
  await trx.transaction(async (sp) => {
    stored.push(...(await sp('interviews').insert(rows).onConflict('id').ignore().returning('id')));
  });
  return stored.map((r) => r.id);
}

/** One plain statement: the common case, with no savepoint's extra round trips. Throws if refused. */
export async function insertAll(trx: Knex.Transaction, rows: NewInterview[]): Promise<InsertOutcome> {
  const stored = rows.length ? await trx('interviews').insert(rows).onConflict('id').ignore().returning('id') : [];
  return { stored: new Set(stored.map((r: { id: string }) => r.id)), refused: new Set() };
}

export async function insertGuarded(trx: Knex.Transaction, rows: NewInterview[]): Promise<InsertOutcome> {
  const outcome: InsertOutcome = { stored: new Set(), refused: new Set() };
  if (rows.length === 0) return outcome;
  try {
    for (const id of await insert(trx, rows)) outcome.stored.add(id);
    return outcome;
  } catch (error) {
    logger.warn(`a batch of ${rows.length} interviews was refused as a whole; storing them one by one: ${String(error)}`);
  }
  for (const row of rows) {
    try {
      for (const id of await insert(trx, [row])) outcome.stored.add(id);
    } catch (error) {
      logger.error(`interview ${row.id} was refused by the database: ${String(error)}`);
      outcome.refused.add(row.id);
    }
  }
  return outcome;
}
