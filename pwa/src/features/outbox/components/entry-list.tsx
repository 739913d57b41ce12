import type { InterviewRecord, OutboxEntry } from '../../../db/plumbline-db';
import { dispositionWord } from '../../../lib/fieldwork-words';
import { formatMoment } from '../../../lib/format';

/** Waiting entries, newest first: when, what outcome, which project. */
export function EntryList({ entries, projectNames }: { entries: OutboxEntry[]; projectNames: Map<string, string> }) {
  return (
    <ul className="pl-entry-list" aria-label="Waiting to be sent">
      {[...entries].reverse().map((entry) => {
        const record = entry.payload as Partial<InterviewRecord> | undefined;
        return (
          <li key={entry.clientId} className="pl-entry">
            <span className="pl-entry-time pl-figure">{formatMoment(record?.endedAt ?? entry.createdAt)}</span>
            <span className="pl-entry-what">{dispositionWord(record?.disposition)}</span>
            <span className="pl-entry-project pl-muted pl-small">{projectNames.get(entry.projectId) ?? 'Project not on this device'}</span>
          </li>
        );
      })}
    </ul>
  );
}
