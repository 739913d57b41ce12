// Reads the outbox count straight from the device (Dexie), so it is right offline too.
import { PageFrame } from '../../../components/page-frame';
import { LoadingPanel } from '../../../components/state-panels';
import { useUnsentCount } from '../../../db/outbox-store';
import { useOnline } from '../../../hooks/use-online';
import { formatCount } from '../../../lib/format';

export function OutboxPage() {
  const unsent = useUnsentCount();
  const online = useOnline();

  return (
    <PageFrame title="Outbox">
      {unsent === undefined ? (
        <LoadingPanel what="the outbox" />
      ) : (
        <section className="pl-outbox" aria-label="Unsent interviews">
          <p className="pl-outbox-count">
            <span className="pl-figure pl-outbox-number">{formatCount(unsent)}</span>
            <span>{unsent === 1 ? 'unsent interview' : 'unsent interviews'} on this device</span>
          </p>
          <p>
            Every interview you log is kept on this device until the office has it. Signing out,
            closing the app or losing the network does not remove it.
          </p>
          {unsent === 0 ? <p className="pl-muted">Nothing is waiting to be sent.</p> : null}
          {!online ? (
            <p className="pl-note-offline" role="status">
              You are offline. Unsent interviews stay here and go to the office when the network is back.
            </p>
          ) : null}
        </section>
      )}
    </PageFrame>
  );
}
