// Applies one server reply to the device in a single transaction: acknowledged entries
// (accepted or already known) leave the outbox, refused ones keep their reason, and the
// returned cell counts become the cached cell status. A reply that never arrives changes nothing.
import { db, type QuotaCell } from './plumbline-db';

export interface BatchOutcome {
  projectId: string;
  /** Accepted or duplicate: the server has them. */
  acknowledged: string[];
  rejected: { clientId: string; reason: string }[];
  cells: QuotaCell[];
  syncedAt: string;
}

export async function settleBatch(outcome: BatchOutcome): Promise<void> {
  await db.transaction('rw', db.outbox, db.cellCache, async () => {
    await db.outbox.bulkDelete(outcome.acknowledged);
    for (const { clientId, reason } of outcome.rejected) {
      await db.outbox.update(clientId, { rejectedReason: reason, rejectedAt: outcome.syncedAt });
    }
    const known = await db.cellCache.get(outcome.projectId);
    await db.cellCache.put({
      projectId: outcome.projectId,
      variables: known?.variables ?? [],
      cells: outcome.cells,
      syncedAt: outcome.syncedAt,
    });
  });
}
