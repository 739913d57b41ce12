// While the office is not reachable, checks again with a cheap GET /api/health at least
// every 10 s (jittered, so a team's phones do not probe in step), so the device learns
// the network is back from a real answer, never from the browser's `online` event alone
// (after a reload with the network cut, Chromium reports online and never sends that event).
// While reachability is unknown (nothing asked yet), one probe settles it. TanStack Query's
// online state follows the same knowledge, so office screens pause while the office is out
// of reach and refetch as soon as it answers. One watch for the whole app; memory only.
import { onlineManager } from '@tanstack/react-query';
import { probeOffice } from './api-client';
import { readReachability, reportNextTry, seemsReachable, subscribeReachability } from './reachability';

export const PROBE_MS = 10_000;

/** Delay before the next probe: between 70% and 100% of the 10 s ceiling. */
export function probeDelay(random = Math.random): number {
  return PROBE_MS * (0.7 + 0.3 * random());
}

let timer: ReturnType<typeof setTimeout> | undefined;
let watching = 0;
let probing = false;

async function probe(): Promise<void> {
  if (probing) return;
  probing = true;
  try {
    await probeOffice();
  } finally {
    probing = false;
  }
  plan();
}

function plan(): void {
  clearTimeout(timer);
  timer = undefined;
  if (watching === 0 || readReachability().reach !== 'unreachable') {
    reportNextTry(null);
    return;
  }
  const delay = probeDelay();
  timer = setTimeout(() => {
    timer = undefined;
    void probe();
  }, delay);
  reportNextTry(Date.now() + delay);
}

function onChange(): void {
  if (probing) return; // the probe plans the next one when it ends
  const unreachable = readReachability().reach === 'unreachable';
  if (unreachable !== (timer !== undefined)) plan();
}

function onBrowserHint(): void {
  // The browser says the network changed: worth a real check, whatever it claims.
  void probe();
}

/** Starts watching (the app root calls it once); returns the function that stops it. */
export function startConnectivityWatch(): () => void {
  watching += 1;
  const unsubscribe = subscribeReachability(onChange);
  if (watching === 1) {
    window.addEventListener('online', onBrowserHint);
    window.addEventListener('offline', onBrowserHint);
    onlineManager.setEventListener((setOnline) => subscribeReachability(() => setOnline(seemsReachable(readReachability()))));
  }
  if (readReachability().reach === 'unknown') void probe();
  else plan();
  return () => {
    unsubscribe();
    watching -= 1;
    if (watching > 0) return;
    window.removeEventListener('online', onBrowserHint);
    window.removeEventListener('offline', onBrowserHint);
    plan();
  };
}
