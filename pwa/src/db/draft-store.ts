// The contact an interviewer is in the middle of logging (table `drafts`, one per
// interviewer), saved after every step so nothing typed is lost to a reload, a crash or a
// closed tab. The outbox store deletes it when the contact is saved.
import { useLiveQuery } from 'dexie-react-hooks';
import { db, type ContactDraft } from './plumbline-db';

/** A draft older than this asks whether to finish or discard it. */
export const STALE_DRAFT_MS = 24 * 60 * 60 * 1000;

export async function saveDraft(draft: Omit<ContactDraft, 'updatedAt'>): Promise<void> {
  await db.drafts.put({ ...draft, updatedAt: new Date().toISOString() });
}

export async function discardDraft(interviewerId: string): Promise<void> {
  await db.drafts.delete(interviewerId);
}

/** `undefined` while reading, `null` when this interviewer has no contact in progress. */
export function useDraft(interviewerId: string | undefined): ContactDraft | null | undefined {
  return useLiveQuery(async () => (interviewerId ? ((await db.drafts.get(interviewerId)) ?? null) : undefined), [interviewerId]);
}

export function isStale(draft: ContactDraft, now = Date.now()): boolean {
  return now - Date.parse(draft.startedAt) > STALE_DRAFT_MS;
}
