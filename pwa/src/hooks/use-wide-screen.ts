import { useSyncExternalStore } from 'react';

/** Side navigation from this width up; bottom navigation below it (phones held in one hand). */
export const wideScreenQuery = '(min-width: 900px)';

function subscribe(onChange: () => void): () => void {
  const list = window.matchMedia(wideScreenQuery);
  list.addEventListener('change', onChange);
  return () => list.removeEventListener('change', onChange);
}

export function useWideScreen(): boolean {
  return useSyncExternalStore(subscribe, () => window.matchMedia(wideScreenQuery).matches, () => false);
}
