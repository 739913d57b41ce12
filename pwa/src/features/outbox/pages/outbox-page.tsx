// Reads the outbox straight from the device (Dexie), so it is right offline too; sending
// goes through the sync module only.
import '../outbox.css';
import { PageFrame } from '../../../components/page-frame';
import { LoadingPanel } from '../../../components/state-panels';
import { useCachedProjects, useLastSync } from '../../../db/cache-store';
import { isRejected, useOthersCount, useOwnEntries, useSentEntries } from '../../../db/outbox-store';
import { useStoredSession } from '../../../db/session-store';
import { useOnline } from '../../../hooks/use-online';
import { formatCount } from '../../../lib/format';
import { useBackgroundSync } from '../../../sync/use-background-sync';
import { EntryList } from '../components/entry-list';
import { RefusedList } from '../components/refused-list';
import { SendPanel } from '../components/send-panel';
import { SentList } from '../components/sent-list';
import { heading, WORDS } from '../../../lib/glossary';

export function OutboxPage() {
  useBackgroundSync();
  const session = useStoredSession();
  const userId = session?.user.id;
  const entries = useOwnEntries(userId);
  const sent = useSentEntries(userId);
  const others = useOthersCount(userId);
  const projects = useCachedProjects(userId);
  const lastSync = useLastSync(userId);
  const online = useOnline();

  const loaded = userId && entries && sent && others !== undefined && projects && lastSync !== undefined;
  const waiting = entries?.filter((e) => !isRejected(e)) ?? [];
  const refused = entries?.filter(isRejected) ?? [];
  const names = new Map((projects ?? []).map((p) => [p.id, p.name]));

  return (
    <PageFrame title={heading(WORDS.outbox.one)}>
      {!loaded ? (
        <LoadingPanel what="the outbox" />
      ) : (
        <>
          <section className="pl-outbox" aria-label={heading(WORDS.unsent.many)}>
            <p className="pl-outbox-count">
              <span className="pl-figure pl-outbox-number">{formatCount(waiting.length)}</span>
              <span>{waiting.length === 1 ? WORDS.unsent.one : WORDS.unsent.many} on this device</span>
            </p>
            <p>
              Every contact you log is kept on this device until the office has it. Signing out, closing the app or
              losing the network does not remove it.
            </p>
            {!online ? (
              <p className="pl-note-offline" role="status">
                The office cannot be reached right now. Nothing is lost: unsent interviews stay here and go to the office as soon as it answers.
              </p>
            ) : null}
            <SendPanel waiting={waiting.length} lastSync={lastSync} />
          </section>
          {waiting.length > 0 ? (
            <EntryList entries={waiting} projectNames={names} userId={userId} />
          ) : (
            <p className="pl-muted pl-outbox-empty">Nothing is waiting to be sent.</p>
          )}
          <RefusedList entries={refused} projectNames={names} userId={userId} />
          <SentList entries={sent} projectNames={names} userId={userId} />
          {others > 0 ? (
            <p className="pl-muted pl-small">
              {formatCount(others)} more {others === 1 ? 'contact was' : 'contacts were'} logged on this device by someone
              else. They are sent when that person signs in again.
            </p>
          ) : null}
        </>
      )}
    </PageFrame>
  );
}
