// What the sync is doing right now, for the screens: a tiny store outside React so the
// engine can report without knowing about components. Lives in memory only.
import { useSyncExternalStore } from 'react';

export interface SyncProgress {
  running: boolean;
  /** Entries the server has answered in this run. */
  sent: number;
  /** Entries this run set out to send. */
  total: number;
  /** Why the last run did not finish everything, in plain words; empty when it did. */
  problems: string[];
}

const idle: SyncProgress = { running: false, sent: 0, total: 0, problems: [] };
let current = idle;
const listeners = new Set<() => void>();

export function reportProgress(next: Partial<SyncProgress>): void {
  current = { ...current, ...next };
  for (const listener of listeners) listener();
}

export function readProgress(): SyncProgress {
  return current;
}

/** Back to the state of a freshly opened app (tests, or another person signing in). */
export function resetProgress(): void {
  reportProgress(idle);
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useSyncProgress(): SyncProgress {
  return useSyncExternalStore(subscribe, readProgress, readProgress);
}
