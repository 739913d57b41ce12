import 'fake-indexeddb/auto';
import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, beforeEach, vi } from 'vitest';
import { db } from '../db/plumbline-db';
import { resetReachability } from '../lib/reachability';
import { mediaQueryList } from './wide-screen';

// Lazily loaded pages take more than the default second to appear on a busy 2-core machine.
configure({ asyncUtilTimeout: 5000 });

// Phone layout unless a test asks for a wide screen (see wide-screen.ts).
if (!window.matchMedia) {
  Object.defineProperty(window, 'matchMedia', { writable: true, value: (query: string) => mediaQueryList(query, false) });
}

// jsdom has no ResizeObserver; the balance charts' responsive container asks for one.
if (!('ResizeObserver' in window)) {
  class NoResizeObserver {
    observe() {}
    unobserve() {}
    disconnect() {}
  }
  Object.defineProperty(window, 'ResizeObserver', { writable: true, value: NoResizeObserver });
}

beforeEach(async () => {
  resetReachability();
  await Promise.all(db.tables.map((table) => table.clear()));
  window.localStorage.clear();
  window.history.replaceState(null, '', '/');
});

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});
