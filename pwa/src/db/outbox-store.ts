// Contacts logged on this device (table `outbox`). They stay here, signed in or not, until
// the server acknowledges them; only the sync module removes them after the server's reply,
// or the interviewer discards one the server refused.
import { useLiveQuery } from 'dexie-react-hooks';
import { db, isVoidRecord, type HeadlineAnswer, type InterviewRecord, type OutboxEntry, type SentEntry } from './plumbline-db';

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

/**
 * Voids a contact still waiting on the device: it is removed and never sent. Only the
 * interviewer's own waiting contact; false when it has gone meanwhile (sent, or not theirs).
 */
export async function voidWaiting(clientId: string, interviewerId: string): Promise<boolean> {
  return db.transaction('rw', db.outbox, async () => {
    const entry = await db.outbox.get(clientId);
    if (!entry || entry.interviewerId !== interviewerId || isRejected(entry) || isVoidRecord(entry.payload)) return false;
    await db.outbox.delete(clientId);
    return true;
  });
}

/** Changes the headline answer of a complete still waiting on the device; false when it has gone meanwhile. */
export async function changeWaitingAnswer(clientId: string, interviewerId: string, answer: HeadlineAnswer): Promise<boolean> {
  return db.transaction('rw', db.outbox, async () => {
    const entry = await db.outbox.get(clientId);
    const record = entry?.payload as InterviewRecord | undefined;
    if (!entry || entry.interviewerId !== interviewerId || isRejected(entry) || record?.disposition !== 'complete') return false;
    await db.outbox.update(clientId, { payload: { ...record, headlineAnswer: answer } });
    return true;
  });
}

/** Queues the void of a contact the server already has; the sync module sends it. */
export async function addVoidToOutbox(sent: SentEntry, interviewerId: string, reason: string): Promise<boolean> {
  return db.transaction('rw', db.outbox, db.sent, async () => {
    const current = await db.sent.get(sent.clientId);
    if (!current || current.interviewerId !== interviewerId || current.voidReason !== undefined) return false;
    await db.outbox.put({
      clientId: sent.clientId,
      interviewerId,
      projectId: sent.projectId,
      createdAt: new Date().toISOString(),
      payload: { kind: 'void', id: sent.clientId, reason },
    });
    await db.sent.update(sent.clientId, { voidReason: reason });
    return true;
  });
}

/** This interviewer's acknowledged contacts, newest first; `undefined` while reading. */
export function useSentEntries(interviewerId: string | undefined): SentEntry[] | undefined {
  return useLiveQuery(
    async () => (interviewerId ? (await db.sent.where('interviewerId').equals(interviewerId).sortBy('sentAt')).reverse() : undefined),
    [interviewerId],
  );
}
