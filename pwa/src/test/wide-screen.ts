import { vi } from 'vitest';

/** A MediaQueryList stand-in: jsdom has no matchMedia; Ionic and the shell ask it about screen width. */
export function mediaQueryList(query: string, matches: boolean): MediaQueryList {
  return {
    matches,
    media: query,
    onchange: null,
    addListener: () => {},
    removeListener: () => {},
    addEventListener: () => {},
    removeEventListener: () => {},
    dispatchEvent: () => false,
  };
}

/** Makes the app lay itself out for a desktop (side navigation, tables). */
export function onWideScreen(): void {
  vi.spyOn(window, 'matchMedia').mockImplementation((query: string) => mediaQueryList(query, true));
}
