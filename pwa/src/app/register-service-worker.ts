import { registerSW } from 'virtual:pwa-register';

/** Installs the service worker that keeps the app shell and fonts for offline use. */
export function registerServiceWorker(): void {
  if (!('serviceWorker' in navigator)) return;
  registerSW({ immediate: true });
}
