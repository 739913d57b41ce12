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
 * A small, always-visible note of whether the office can be reached, as real requests
 * showed it (lib/reachability): online, checking, or offline since when and when the
 * device tries again.
 */
export function OnlineIndicator() {
  const { reach, since, nextTryAt } = useReachability();
  const now = useTicking(reach === 'unreachable' && nextTryAt !== null);
  if (reach !== 'unreachable') {
    return (
      <span className={`pl-online ${reach === 'reachable' ? 'is-online' : 'is-checking'}`} role="status" aria-live="polite">
        <span className="pl-online-dot" aria-hidden="true" />
        {reach === 'reachable' ? 'Online' : 'Checking…'}
      </span>
    );
  }
  const sinceText = since === null ? '' : `since ${formatClock(new Date(since).toISOString())}`;
  const seconds = nextTryAt === null ? null : Math.max(0, Math.ceil((nextTryAt - now) / 1000));
  const nextText = seconds === null ? '' : seconds === 0 ? 'trying now' : `next try in ${seconds} s`;
  const detail = [sinceText, nextText].filter(Boolean).join(' · ');
  return (
    <span
      className="pl-online is-offline"
      role="status"
      aria-live="polite"
      title={`The office cannot be reached${since === null ? '' : ` ${sinceText}`}. Everything you log stays on this device.`}
    >
      <span className="pl-online-dot" aria-hidden="true" />
      <span>Offline</span>
      {detail ? <span className="pl-online-detail">{detail}</span> : null}
    </span>
  );
}
