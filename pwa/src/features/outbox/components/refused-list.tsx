import { useState } from 'react';
import { Dialog } from '../../../components/dialog';
import { discardRejected } from '../../../db/outbox-store';
import { isVoidRecord, type InterviewRecord, type OutboxEntry } from '../../../db/plumbline-db';
import { dispositionWord } from '../../../lib/fieldwork-words';
import { formatMoment } from '../../../lib/format';

interface RefusedListProps {
  entries: OutboxEntry[];
  projectNames: Map<string, string>;
  userId: string;
}

/** Entries the server refused, with its reason. Kept until the interviewer discards one on purpose. */
export function RefusedList({ entries, projectNames, userId }: RefusedListProps) {
  const [discarding, setDiscarding] = useState<OutboxEntry | null>(null);
  if (entries.length === 0) return null;
  return (
    <section className="pl-refused" aria-labelledby="pl-refused-title">
      <h2 id="pl-refused-title" className="pl-section-title">
        Refused by the server ({entries.length})
      </h2>
      <p className="pl-small">These stay on this device and are not sent again. Show them to your supervisor if the reason is unclear.</p>
      <ul className="pl-entry-list">
        {entries.map((entry) => {
          const record = entry.payload as Partial<InterviewRecord> | undefined;
          return (
            <li key={entry.clientId} className="pl-entry is-refused">
              <span className="pl-entry-time pl-figure">{formatMoment(record?.endedAt ?? entry.createdAt)}</span>
              <span className="pl-entry-what">{isVoidRecord(entry.payload) ? 'Void of a sent contact' : dispositionWord(record?.disposition)}</span>
              <span className="pl-entry-project pl-muted pl-small">{projectNames.get(entry.projectId) ?? 'Project not on this device'}</span>
              <span className="pl-entry-reason">Reason: {entry.rejectedReason}</span>
              <button type="button" className="pl-button pl-button-quiet pl-entry-discard" onClick={() => setDiscarding(entry)}>
                Discard…
              </button>
            </li>
          );
        })}
      </ul>
      {discarding ? (
        <Dialog title="Discard this contact?" onClose={() => setDiscarding(null)}>
          <p className="pl-dialog-warning">
            It is removed from this device for good. The office never received it.
          </p>
          <div className="pl-dialog-actions">
            <button type="button" className="pl-button pl-button-quiet" onClick={() => setDiscarding(null)} autoFocus>
              Keep it
            </button>
            <button
              type="button"
              className="pl-button pl-button-main"
              onClick={() => void discardRejected(discarding.clientId, userId).then(() => setDiscarding(null))}
            >
              Discard
            </button>
          </div>
        </Dialog>
      ) : null}
    </section>
  );
}
