import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';
import { compression } from 'vite-plugin-compression2';
import { shellOnly } from './scripts/shell-only.ts';

const pwaRoot = fileURLToPath(new URL('.', import.meta.url));
const fontsDir = fileURLToPath(new URL('../fonts', import.meta.url));
const themeColour = '#1d4f54';
const paper = '#f6f3ec';

// Built into pwa/dist, which the API serves. The service worker precaches the shell,
// the icons and the fonts, so the app opens offline after one online visit.
export default defineConfig({
  root: pwaRoot,
  resolve: { alias: { '@fonts': fontsDir } },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    // Lists each chunk's static imports, so the service worker can precache the shell alone.
    manifest: true,
    rolldownOptions: {
      // Ionic's component modules only define classes (each is registered when its React
      // wrapper first renders) but the package does not say so, which keeps all ~90 of them
      // in every bundle. Declaring them free of side effects drops the ones the app never uses.
      treeshake: { moduleSideEffects: (id) => !/[\\/]@ionic[\\/]core[\\/]components[\\/]ion-[\w-]+\.js$/.test(id) },
    },
  },
  server: {
    port: 5173,
    proxy: { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } },
  },
  preview: {
    proxy: { '/api': { target: 'http://127.0.0.1:3000', changeOrigin: false } },
  },
  plugins: [
    react(),
    // Brotli and gzip copies beside each file; the API picks one by Accept-Encoding.
    compression({ algorithms: ['brotliCompress', 'gzip'], include: /\.(js|css|html|svg|json|webmanifest)$/, threshold: 1024 }),
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
        // The shell (entry script and what it imports statically, styles, fonts, icons) is
        // precached; each role's pages are cached as they load (all of a role's pages come in
        // one chunk, loaded at sign-in), so a phone never downloads other roles' code.
        globPatterns: ['**/*.{js,css,html,svg,png,woff2,webmanifest}'],
        globIgnores: ['**/.vite/**'],
        manifestTransforms: [shellOnly(fileURLToPath(new URL('./dist', import.meta.url)))],
        runtimeCaching: [
          {
            urlPattern: ({ sameOrigin, url }) => sameOrigin && url.pathname.startsWith('/assets/'),
            handler: 'CacheFirst',
            options: { cacheName: 'plumbline-pages', expiration: { maxEntries: 200 } },
          },
        ],
        navigateFallback: 'index.html',
        navigateFallbackDenylist: [/^\/api(\/|$)/],
      },
    }),
  ],
});
