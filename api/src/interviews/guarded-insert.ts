// Stores a batch's new interviews in one statement inside a savepoint. Every item was
// checked beforehand, so the database should refuse nothing; if it still does, the rows go
// in one by one, each in its own savepoint, and only the refused ones are reported, so one
// row can never fail the batch.
import { Logger } from '@nestjs/common';
import type { Knex } from 'knex';
import type { InterviewRow } from '../database/tables.js';

export type NewInterview = Omit<InterviewRow, 'received_at' | 'review_status' | 'counted'>;

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
