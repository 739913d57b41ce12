import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';

const pwaRoot = fileURLToPath(new URL('.', import.meta.url));
const fontsDir = fileURLToPath(new URL('../fonts', import.meta.url));
const themeColour = '#1d4f54';
const paper = '#f6f3ec';

// Built into pwa/dist, which the API serves. The service worker precaches the shell,
// the icons and the fonts, so the app opens offline after one online visit.
export default defineConfig({
  root: pwaRoot,
  resolve: { alias: { '@fonts': fontsDir } },
  build: { outDir: 'dist', emptyOutDir: true, sourcemap: true },
  server: {
    port: 5173,
    proxy: { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } },
  },
  preview: {
    proxy: { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } },
  },
  plugins: [
    react(),
    VitePWA({
      // Registered from src/app/register-service-worker.ts: the server's CSP allows no inline script.
      injectRegister: false,
      registerType: 'autoUpdate',
      manifest: {
        name: 'Plumbline',
        short_name: 'Plumbline',
        description: 'Survey fieldwork kept level while it runs: log interviews offline, watch quotas and balance.',
        lang: 'en',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        orientation: 'any',
        theme_color: themeColour,
        background_color: paper,
        icons: [
          { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
          { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
          { src: '/icons/maskable-192.png', sizes: '192x192', type: 'image/png', purpose: 'maskable' },
          { src: '/icons/maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
        ],
      },
      workbox: {
        clientsClaim: true,
        skipWaiting: true,
        cleanupOutdatedCaches: true,
        globPatterns: ['**/*.{js,css,html,svg,png,woff2,webmanifest}'],
        navigateFallback: 'index.html',
        navigateFallbackDenylist: [/^\/api(\/|$)/],
      },
    }),
  ],
});
