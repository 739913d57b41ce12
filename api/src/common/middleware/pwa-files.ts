// Serves the built PWA's files from the same origin as the API. Text files are sent as the
// brotli or gzip copy the build made beside them (chosen by Accept-Encoding), so a phone on
// a slow link downloads the app's code compressed with no work per request. Hashed files
// under /assets/ never change and are cached for a year; the page and the service worker
// are re-checked on every visit so an update reaches devices.
import expressStaticGzip from 'express-static-gzip';
import type { RequestHandler } from 'express';

export function pwaFiles(distDir: string): RequestHandler {
  return expressStaticGzip(distDir, {
    enableBrotli: true,
    orderPreference: ['br', 'gz'],
    index: false,
    serveStatic: {
      index: false,
      setHeaders: (res, path) => {
        res.setHeader('Cache-Control', /[\\/]assets[\\/]/.test(path) ? 'public, max-age=31536000, immutable' : 'no-cache');
      },
    },
  });
}
