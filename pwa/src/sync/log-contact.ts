// Logging a contact: the record gets its UUID here and is written to the outbox before
// anything else happens; only then, if the device is online, a sync is started (its
// outcome does not matter to the person logging: the contact is safe on the device).
import { v4 as uuidv4 } from 'uuid';
import { addToOutbox } from '../db/outbox-store';
import type { InterviewRecord } from '../db/plumbline-db';
import { syncNow } from './sync-scheduler';

export type ContactDraft = Omit<InterviewRecord, 'id' | 'endedAt'>;

export async function logContact(interviewerId: string, projectId: string, draft: ContactDraft): Promise<InterviewRecord> {
  const record: InterviewRecord = { id: uuidv4(), ...draft, endedAt: new Date().toISOString() };
  // A complete carries every category and the answer; a partial or refusal may carry the
  // categories the interviewer could see (for comparing nonresponse by cell); others neither.
  if (record.disposition !== 'complete') {
    delete record.headlineAnswer;
    delete record.respondentReference;
  }
  // Turned away because the cell was full keeps the categories that showed it.
  if (!['complete', 'partial', 'refusal', 'quota_full'].includes(record.disposition) || Object.keys(record.categories ?? {}).length === 0) {
    delete record.categories;
  }
  if (!['non_contact', 'other'].includes(record.disposition)) delete record.eligibilityKnown;
  await addToOutbox(interviewerId, projectId, record);
  void syncNow();
  return record;
}
