import { useOnline } from '../hooks/use-online';

/** A small, always-visible note of whether this device is online. */
export function OnlineIndicator() {
  const online = useOnline();
  return (
    <span className={`pl-online ${online ? 'is-online' : 'is-offline'}`} role="status" aria-live="polite">
      <span className="pl-online-dot" aria-hidden="true" />
      {online ? 'Online' : 'Offline'}
    </span>
  );
}
