import { useState } from 'react';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { isVoidRecord, type HeadlineAnswer, type InterviewRecord, type OutboxEntry } from '../../../db/plumbline-db';
import { dispositionWord, headlineAnswerOf, headlineAnswerOrder, headlineAnswerWords } from '../../../lib/fieldwork-words';
import { formatMoment } from '../../../lib/format';
import { changeUnsentAnswer, voidUnsentContact } from '../../../sync/void-contact';

interface EntryListProps {
  entries: OutboxEntry[];
  projectNames: Map<string, string>;
  userId: string;
}

/** Waiting entries, newest first: when, what outcome, which project; a contact still here can be corrected or voided. */
export function EntryList({ entries, projectNames, userId }: EntryListProps) {
  const [voiding, setVoiding] = useState<OutboxEntry | null>(null);
  return (
    <>
      <ul className="pl-entry-list" aria-label="Waiting to be sent">
        {[...entries].reverse().map((entry) => {
          if (isVoidRecord(entry.payload)) {
            return (
              <li key={entry.clientId} className="pl-entry">
                <span className="pl-entry-time pl-figure">{formatMoment(entry.createdAt)}</span>
                <span className="pl-entry-what">Void of a sent contact</span>
                <span className="pl-entry-project pl-muted pl-small">Reason: {entry.payload.reason}</span>
              </li>
            );
          }
          const record = entry.payload as Partial<InterviewRecord> | undefined;
          const answer = headlineAnswerOf(record?.headlineAnswer);
          const when = formatMoment(record?.endedAt ?? entry.createdAt);
          return (
            <li key={entry.clientId} className="pl-entry">
              <span className="pl-entry-time pl-figure">{when}</span>
              <span className="pl-entry-what">{dispositionWord(record?.disposition)}</span>
              <span className="pl-entry-project pl-muted pl-small">{projectNames.get(entry.projectId) ?? 'Project not on this device'}</span>
              {record?.disposition === 'complete' && answer ? (
                <label className="pl-entry-answer pl-small">
                  Answer{' '}
                  <select
                    value={answer}
                    onChange={(event) => void changeUnsentAnswer(entry.clientId, userId, event.target.value as HeadlineAnswer)}
                  >
                    {headlineAnswerOrder.map((a) => (
                      <option key={a} value={a}>
                        {headlineAnswerWords[a]}
                      </option>
                    ))}
                  </select>
                </label>
              ) : null}
              <button type="button" className="pl-button pl-button-quiet pl-entry-discard" onClick={() => setVoiding(entry)}>
                Void…
              </button>
            </li>
          );
        })}
      </ul>
      {voiding ? (
        <ConfirmDialog
          title="Void this contact?"
          confirmLabel="Void it"
          cancelLabel="Keep it"
          main="cancel"
          onConfirm={() => void voidUnsentContact(voiding.clientId, userId).then(() => setVoiding(null))}
          onCancel={() => setVoiding(null)}
        >
          <p className="pl-dialog-warning">It has not been sent: it is removed from this device and the office never receives it.</p>
        </ConfirmDialog>
      ) : null}
    </>
  );
}
