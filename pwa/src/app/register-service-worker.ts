import { registerSW } from 'virtual:pwa-register';

/**
 * Installs the service worker that keeps the app shell and fonts for offline use. The shell
 * is precached; each role's pages are cached as they load. Files this page loaded before the
 * service worker took control are fetched once more through it, so they are kept too (from
 * the browser's own cache, as they never change: nothing is downloaded twice).
 */
export function registerServiceWorker(): void {
  if (!('serviceWorker' in navigator)) return;
  registerSW({ immediate: true });
  void keepLoadedFiles();
}

async function keepLoadedFiles(): Promise<void> {
  await navigator.serviceWorker.ready;
  if (!navigator.serviceWorker.controller) {
    await new Promise((resolve) => navigator.serviceWorker.addEventListener('controllerchange', resolve, { once: true }));
  }
  const files = performance
    .getEntriesByType('resource')
    .map((entry) => new URL(entry.name))
    .filter((url) => url.origin === location.origin && url.pathname.startsWith('/assets/'));
  await Promise.all(files.map((url) => fetch(url).catch(() => undefined)));
}
