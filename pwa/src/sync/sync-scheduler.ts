// When the device syncs, while an interviewer's screens are open. It never waits for the
// browser's `online` event (it may never come) and never trusts the online flag alone:
//   - reachable: a sync every ~15 s (jittered), so a closed cell reaches the phone in
//     about 20 s; the project and cell reads are cheap when nothing changed (ETag).
//   - a failed sync: retries back off exponentially with jitter, the first within about
//     5 s, capped at 60 s. Meanwhile lib/connectivity-watch probes GET /api/health at least
//     every 10 s, and the moment a probe (or any request) is answered, a sync starts.
//   - at once: when the first screen mounts, on the browser's online event, when the app
//     comes back to the foreground, on demand (Send now) and after a contact is logged.
// One schedule for the whole app, however many screens use it. Lives in memory only.
import { readReachability, subscribeReachability, type Reach } from '../lib/reachability';
import { requestSync, type SyncOutcome } from './sync-engine';

export const REGULAR_MS = 15_000;
export const FIRST_RETRY_MS = 5_000;
export const MAX_RETRY_MS = 60_000;

/** Backoff after `failures` failed attempts in a row: exponential with "equal jitter" (half fixed, half random). */
export function retryDelay(failures: number, random = Math.random): number {
  const ceiling = Math.min(MAX_RETRY_MS, FIRST_RETRY_MS * 2 ** Math.max(0, failures - 1));
  return ceiling / 2 + random() * (ceiling / 2);
}

/** The regular pace while the office is reachable, jittered ±20% so devices do not move in step. */
export function regularDelay(random = Math.random): number {
  return REGULAR_MS * (0.8 + 0.4 * random());
}

let users = 0;
let failures = 0;
let timer: ReturnType<typeof setTimeout> | undefined;
let busy: Promise<void> | null = null;
let lastReach: Reach = readReachability().reach;
let unsubscribe: (() => void) | undefined;

function schedule(delay: number): void {
  clearTimeout(timer);
  timer = users > 0 ? setTimeout(() => void attempt(), delay) : undefined;
}

function afterOutcome(outcome: SyncOutcome): void {
  if (outcome === 'offline' || outcome === 'incomplete') {
    failures += 1;
    schedule(retryDelay(failures));
  } else if (outcome === 'signed-out' || outcome === 'skipped') {
    // Nothing to send under this sign-in; the next sign-in mounts the screens again.
    clearTimeout(timer);
  } else {
    failures = 0;
    schedule(regularDelay());
  }
}

async function attempt(): Promise<void> {
  if (busy) {
    // A request during a run: the engine queues exactly one more run.
    await requestSync();
    return busy;
  }
  busy = (async () => {
    clearTimeout(timer);
    afterOutcome(await requestSync());
  })().finally(() => {
    busy = null;
  });
  return busy;
}

function onReachability(): void {
  const { reach } = readReachability();
  // The office answered again (a probe or any request): send at once, whatever the backoff says.
  if (reach === 'reachable' && lastReach === 'unreachable') void attempt();
  lastReach = reach;
}

/** Sync now (Send now, a contact just logged): resets the schedule around the result. */
export function syncNow(): Promise<void> {
  return attempt();
}

function onWake(): void {
  if (document.visibilityState === 'visible') void attempt();
}

function onOnline(): void {
  void attempt();
}

/** Starts the schedule for one more screen; the returned function stops it for that screen. */
export function startSyncSchedule(): () => void {
  users += 1;
  if (users === 1) {
    window.addEventListener('online', onOnline);
    window.addEventListener('focus', onWake);
    document.addEventListener('visibilitychange', onWake);
    lastReach = readReachability().reach;
    unsubscribe = subscribeReachability(onReachability);
    void attempt();
  }
  return () => {
    users -= 1;
    if (users > 0) return;
    window.removeEventListener('online', onOnline);
    window.removeEventListener('focus', onWake);
    document.removeEventListener('visibilitychange', onWake);
    unsubscribe?.();
    clearTimeout(timer);
    timer = undefined;
    failures = 0;
  };
}
