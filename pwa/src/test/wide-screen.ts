import { vi } from 'vitest';

/** Makes the app lay itself out for a desktop (side navigation, tables). */
export function onWideScreen(): void {
  vi.spyOn(window, 'matchMedia').mockImplementation((query: string) => ({
    matches: true,
    media: query,
    onchange: null,
    addListener: () => {},
    removeListener: () => {},
    addEventListener: () => {},
    removeEventListener: () => {},
    dispatchEvent: () => false,
  }));
}
