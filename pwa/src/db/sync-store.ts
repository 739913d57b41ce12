// Applies one server reply to the device in a single transaction: acknowledged entries
// (accepted or already known) leave the outbox, refused ones keep their reason, and the
// returned cell counts become the cached cell status. A reply that never arrives changes nothing.
import { db, isVoidRecord, type InterviewRecord, type QuotaCell } from './plumbline-db';

/** How long an acknowledged contact stays on the device so it can still be voided. */
export const SENT_KEPT_DAYS = 14;

export interface BatchOutcome {
  projectId: string;
  /** Accepted or duplicate: the server has them. */
  acknowledged: string[];
  rejected: { clientId: string; reason: string }[];
  cells: QuotaCell[];
  syncedAt: string;
}

export async function settleBatch(outcome: BatchOutcome): Promise<void> {
  await db.transaction('rw', db.outbox, db.cellCache, db.sent, async () => {
    // Acknowledged contacts move to `sent` (a void acknowledged only leaves the outbox).
    const acknowledged = (await db.outbox.bulkGet(outcome.acknowledged)).filter((e) => e !== undefined);
    await db.sent.bulkPut(
      acknowledged
        .filter((e) => !isVoidRecord(e.payload))
        .map((e) => ({ clientId: e.clientId, interviewerId: e.interviewerId, projectId: e.projectId, sentAt: outcome.syncedAt, record: e.payload as InterviewRecord })),
    );
    const oldest = new Date(Date.parse(outcome.syncedAt) - SENT_KEPT_DAYS * 86_400_000).toISOString();
    await db.sent.where('sentAt').below(oldest).delete();
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
