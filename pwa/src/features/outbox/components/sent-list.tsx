import { useState } from 'react';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import type { InterviewRecord, SentEntry } from '../../../db/plumbline-db';
import { dispositionWord } from '../../../lib/fieldwork-words';
import { formatMoment } from '../../../lib/format';
import { VOID_REASON_MAX, voidSentContact } from '../../../sync/void-contact';

interface SentListProps {
  entries: SentEntry[];
  projectNames: Map<string, string>;
  userId: string;
}

/** Contacts the office has from this device (last two weeks); one logged by mistake can be voided with a reason. */
export function SentList({ entries, projectNames, userId }: SentListProps) {
  const [voiding, setVoiding] = useState<SentEntry | null>(null);
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  if (entries.length === 0) return null;
  const close = () => {
    setVoiding(null);
    setReason('');
    setProblem(null);
  };
  const confirm = async (entry: SentEntry) => {
    const text = reason.trim();
    if (text.length === 0) return setProblem('Say why it should not count.');
    if (text.length > VOID_REASON_MAX) return setProblem(`Keep the reason to ${VOID_REASON_MAX} characters.`);
    await voidSentContact(userId, entry, text);
    close();
  };
  return (
    <section className="pl-sent" aria-labelledby="pl-sent-title">
      <h2 id="pl-sent-title" className="pl-section-title">
        Sent from this device ({entries.length})
      </h2>
      <p className="pl-small">If one was logged by mistake, void it with a reason: it stops counting and your supervisor sees why.</p>
      <ul className="pl-entry-list" aria-label="Sent from this device">
        {entries.map((entry) => {
          const record: Partial<InterviewRecord> = entry.record;
          return (
            <li key={entry.clientId} className="pl-entry">
              <span className="pl-entry-time pl-figure">{formatMoment(record.endedAt ?? entry.sentAt)}</span>
              <span className="pl-entry-what">{dispositionWord(record.disposition)}</span>
              <span className="pl-entry-project pl-muted pl-small">{projectNames.get(entry.projectId) ?? 'Project not on this device'}</span>
              {entry.voidReason !== undefined ? (
                <span className="pl-entry-reason">Voided: {entry.voidReason}</span>
              ) : (
                <button type="button" className="pl-button pl-button-quiet pl-entry-discard" onClick={() => setVoiding(entry)}>
                  Void…
                </button>
              )}
            </li>
          );
        })}
      </ul>
      {voiding ? (
        <ConfirmDialog
          title="Void a sent contact?"
          confirmLabel="Void it"
          cancelLabel="Keep it"
          onConfirm={() => void confirm(voiding)}
          onCancel={close}
          problem={problem}
          problemId="pl-void-problem"
        >
          <p>It stays on record for your supervisor with your reason, but no longer counts in any cell or figure.</p>
          <label className="pl-field">
            <span>Reason</span>
            <textarea value={reason} maxLength={VOID_REASON_MAX} onChange={(event) => setReason(event.target.value)} aria-describedby={problem ? 'pl-void-problem' : undefined} />
          </label>
        </ConfirmDialog>
      ) : null}
    </section>
  );
}
