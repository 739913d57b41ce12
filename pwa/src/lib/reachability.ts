// Whether this device can reach the office (the API), learnt from the outcome of real
// requests: every answer from the server says "reachable", every request that fails on the
// network (or is answered by a gateway saying the server is down) says "not reachable".
// The browser's online flag is only a hint: phones report "online" with no data, and after
// a reload with the network cut Chromium reports online while every request fails.
// Lives in memory only; the api-client reports to it, the sync scheduler says when it will
// try again, and the screens read it.
import { useSyncExternalStore } from 'react';

export type Reach = 'unknown' | 'reachable' | 'unreachable';

export interface Reachability {
  reach: Reach;
  /** When the current outage was first seen (epoch ms); null while reachable or unknown. */
  since: number | null;
  /** When the device will next try to reach the office, if a retry is planned (epoch ms). */
  nextTryAt: number | null;
}

const initial: Reachability = { reach: 'unknown', since: null, nextTryAt: null };
let current = initial;
const listeners = new Set<() => void>();

function update(next: Partial<Reachability>): void {
  const merged = { ...current, ...next };
  if (merged.reach === current.reach && merged.since === current.since && merged.nextTryAt === current.nextTryAt) return;
  current = merged;
  for (const listener of listeners) listener();
}

/** A request got an answer from the office. */
export function reportReached(): void {
  update({ reach: 'reachable', since: null });
}

/** A request could not reach the office. */
export function reportUnreachable(at = Date.now()): void {
  update({ reach: 'unreachable', since: current.reach === 'unreachable' ? current.since : at });
}

export function reportNextTry(at: number | null): void {
  update({ nextTryAt: at });
}

export function readReachability(): Reachability {
  return current;
}

/** Back to "not known yet" (tests, or a fresh start). */
export function resetReachability(): void {
  current = initial;
  for (const listener of listeners) listener();
}

export function subscribeReachability(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

export function useReachability(): Reachability {
  return useSyncExternalStore(subscribeReachability, readReachability, readReachability);
}

/**
 * Whether to treat the office as reachable right now: what the last request showed, and
 * before any request has been made, the browser's hint.
 */
export function seemsReachable(state: Reachability): boolean {
  if (state.reach === 'unknown') return typeof navigator === 'undefined' || navigator.onLine !== false;
  return state.reach === 'reachable';
}
