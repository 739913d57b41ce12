import { useEffect, useState } from 'react';
import { formatClock } from '../lib/format';
import { useReachability } from '../lib/reachability';

/** Re-renders every second while `active`, for a countdown. */
function useTicking(active: boolean): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!active) return;
    const timer = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(timer);
  }, [active]);
  return now;
}

/**
 * A small, always-visible note in the header of whether the office can be reached, as
 * real requests showed it (lib/reachability): online, checking, or offline.
 */
export function OnlineIndicator() {
  const { reach } = useReachability();
  const [label, tone] = reach === 'reachable' ? ['Online', 'is-online'] : reach === 'unknown' ? ['Checking…', 'is-checking'] : ['Offline', 'is-offline'];
  return (
    <span className={`pl-online ${tone}`} role="status" aria-live="polite">
      <span className="pl-online-dot" aria-hidden="true" />
      {label}
    </span>
  );
}

/** Under the header while the office is out of reach: since when, and when the device tries again. */
export function OfflineStrip() {
  const { reach, since, nextTryAt } = useReachability();
  const now = useTicking(reach === 'unreachable' && nextTryAt !== null);
  if (reach !== 'unreachable') return null;
  const seconds = nextTryAt === null ? null : Math.max(0, Math.ceil((nextTryAt - now) / 1000));
  return (
    <p className="pl-offline-strip" role="status">
      <span>Office not reachable{since === null ? '' : ` since ${formatClock(new Date(since).toISOString())}`}</span>
      {seconds === null ? null : <span>{seconds === 0 ? 'trying now' : `next try in ${seconds} s`}</span>}
    </p>
  );
}
