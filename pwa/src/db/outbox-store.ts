// Contacts logged on this device (table `outbox`). They stay here, signed in or not, until
// the server acknowledges them; only the sync module removes them after the server's reply,
// or the interviewer discards one the server refused.
import { useLiveQuery } from 'dexie-react-hooks';
import { db, type InterviewRecord, type OutboxEntry } from './plumbline-db';

export async function countUnsent(): Promise<number> {
  return db.outbox.count();
}

/** This interviewer's entries still waiting to be sent; `undefined` while the device storage is being read. */
export function useUnsentCount(interviewerId: string): number | undefined {
  return useLiveQuery(async () => (await listWaiting(interviewerId)).length, [interviewerId]);
}

export function isRejected(entry: OutboxEntry): boolean {
  return typeof entry.rejectedReason === 'string';
}

/**
 * Writes one contact to the device. Nothing else happens before this has finished. The
 * interviewer's draft goes in the same transaction, so a crash cannot leave both (and a
 * resumed draft saved twice).
 */
export async function addToOutbox(interviewerId: string, projectId: string, record: InterviewRecord): Promise<void> {
  await db.transaction('rw', db.outbox, db.drafts, async () => {
    await db.outbox.add({
      clientId: record.id,
      interviewerId,
      projectId,
      createdAt: new Date().toISOString(),
      payload: record,
    });
    await db.drafts.delete(interviewerId);
  });
}

/** This interviewer's entries, oldest first (sent and refused alike). */
export async function listOwnEntries(interviewerId: string): Promise<OutboxEntry[]> {
  return db.outbox.where('interviewerId').equals(interviewerId).sortBy('createdAt');
}

/** This interviewer's entries waiting to be sent, oldest first. */
export async function listWaiting(interviewerId: string): Promise<OutboxEntry[]> {
  return (await listOwnEntries(interviewerId)).filter((entry) => !isRejected(entry));
}

/** `undefined` while reading (or while nobody is known to be signed in). */
export function useOwnEntries(interviewerId: string | undefined): OutboxEntry[] | undefined {
  return useLiveQuery(async () => (interviewerId ? listOwnEntries(interviewerId) : undefined), [interviewerId]);
}

/** How many entries on this device belong to someone other than `interviewerId`. */
export function useOthersCount(interviewerId: string | undefined): number | undefined {
  return useLiveQuery(
    async () => (interviewerId ? db.outbox.where('interviewerId').notEqual(interviewerId).count() : undefined),
    [interviewerId],
  );
}

/** Removes one refused entry on the interviewer's deliberate choice; waiting entries are never discarded here. */
export async function discardRejected(clientId: string, interviewerId: string): Promise<boolean> {
  return db.transaction('rw', db.outbox, async () => {
    const entry = await db.outbox.get(clientId);
    if (!entry || entry.interviewerId !== interviewerId || !isRejected(entry)) return false;
    await db.outbox.delete(clientId);
    return true;
  });
}
