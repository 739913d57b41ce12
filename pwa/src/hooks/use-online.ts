import { seemsReachable, useReachability } from '../lib/reachability';

/**
 * Whether the office (the API) can be reached right now, as the last real request showed;
 * before any request, the browser's hint. Never the browser's online flag alone.
 */
export function useOnline(): boolean {
  return seemsReachable(useReachability());
}
