// Voiding a contact the server already has: the void is written to the outbox first, like a
// logged contact, then a sync is started. The server answers it "voided" (or "duplicate"
// when it was voided already), which acknowledges it; a refusal keeps its reason on the
// device like any refused item.
import { addVoidToOutbox } from '../db/outbox-store';
import type { SentEntry } from '../db/plumbline-db';
import { syncNow } from './sync-scheduler';

export const VOID_REASON_MAX = 500;

export async function voidSentContact(interviewerId: string, sent: SentEntry, reason: string): Promise<boolean> {
  const text = reason.trim();
  if (text.length === 0 || text.length > VOID_REASON_MAX) return false;
  const queued = await addVoidToOutbox(sent, interviewerId, text);
  if (queued) void syncNow();
  return queued;
}
