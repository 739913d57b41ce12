// Corrections. A contact still waiting on the device can have its answer changed or be
// voided (removed, never sent), only while no batch is in flight (whileSyncIdle), so the
// server never receives the old version. Voiding a contact the server already has: the void
// is written to the outbox first, like a logged contact, then a sync is started. The server
// answers it "voided" (or "duplicate" when it was voided already), which acknowledges it; a
// refusal keeps its reason on the device like any refused item.
import { addVoidToOutbox, changeWaitingAnswer, voidWaiting } from '../db/outbox-store';
import type { HeadlineAnswer, SentEntry } from '../db/plumbline-db';
import { whileSyncIdle } from './sync-engine';
import { syncNow } from './sync-scheduler';

export function voidUnsentContact(clientId: string, interviewerId: string): Promise<boolean> {
  return whileSyncIdle(() => voidWaiting(clientId, interviewerId));
}

export function changeUnsentAnswer(clientId: string, interviewerId: string, answer: HeadlineAnswer): Promise<boolean> {
  return whileSyncIdle(() => changeWaitingAnswer(clientId, interviewerId, answer));
}

export const VOID_REASON_MAX = 500;

export async function voidSentContact(interviewerId: string, sent: SentEntry, reason: string): Promise<boolean> {
  const text = reason.trim();
  if (text.length === 0 || text.length > VOID_REASON_MAX) return false;
  const queued = await addVoidToOutbox(sent, interviewerId, text);
  if (queued) void syncNow();
  return queued;
}
