// Keeps the outbox moving while an interviewer's screens are open: one sync when the first
// screen mounts (app start, or after signing in), one whenever the browser comes back
// online, and one every minute while online. Screens call the hook; the schedule is shared,
// so several mounted screens still make one timer.
import { useEffect } from 'react';
import { requestSync } from './sync-engine';

export const SYNC_INTERVAL_MS = 60_000;

let users = 0;
let timer: ReturnType<typeof setInterval> | undefined;

function syncIfOnline(): void {
  if (navigator.onLine) void requestSync();
}

function start(): void {
  window.addEventListener('online', syncIfOnline);
  timer = setInterval(syncIfOnline, SYNC_INTERVAL_MS);
  syncIfOnline();
}

function stop(): void {
  window.removeEventListener('online', syncIfOnline);
  clearInterval(timer);
  timer = undefined;
}

export function useBackgroundSync(): void {
  useEffect(() => {
    users += 1;
    if (users === 1) start();
    return () => {
      users -= 1;
      if (users === 0) stop();
    };
  }, []);
}
