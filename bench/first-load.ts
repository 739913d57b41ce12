/**
 * First-load benchmark (not a test): an interviewer's cold first visit on an emulated
 * slow-4G link (Chrome DevTools Protocol Network.emulateNetworkConditions: 562.5 ms
 * latency, 180 KB/s down, 84 KB/s up), in Debian's Chromium at phone size, against the
 * built API and PWA on loopback with the Vellmoor demo seeded. Three cold runs; it prints
 * the median of each figure:
 *   - the sign-in form usable, from the start of navigation;
 *   - "Log a contact" usable, from the tap on Sign in (sign-in, the interviewer's pages,
 *     the first sync of projects and cells);
 *   - JavaScript transferred in the first 30 s (compressed bytes on the wire, the service
 *     worker's downloads included).
 *
 *   npm run bench:first-load     (after `npm start` or `npm test` has built both halves)
 *
 * It uses its own database (plumbline_bench_ui), recreated on every run.
 */
import { execFileSync, spawn } from 'node:child_process';
import { join, resolve } from 'node:path';
import { openBrowser, PHONE } from '../test/browser/browser.js';
import { migrateLatest } from '../scripts/migrate.js';

/** The benchmark sends no mail; the setting is required, nothing listens there. */
const NO_MAIL = 'smtp://127.0.0.1:1025';

const root = resolve(import.meta.dirname, '..');
const PORT = 3933;
const BASE = `http://127.0.0.1:${PORT}`;
const SLOW_4G = { offline: false, latency: 562.5, downloadThroughput: 180 * 1024, uploadThroughput: 84 * 1024 };
const RUNS = 3;

function databaseUrl(): string {
  const script = 'source scripts/lib.sh && ensure_postgres_running >/dev/null && ensure_database plumbline_bench_ui --fresh && database_url plumbline_bench_ui';
  return execFileSync('bash', ['-c', script], { cwd: root, encoding: 'utf8' }).trim().split('\n').at(-1) as string;
}

async function coldVisit(): Promise<{ formMs: number; logMs: number; jsBytes: number }> {
  const { context, page, close } = await openBrowser(PHONE);
  try {
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', SLOW_4G);
    let jsBytes = 0;
    const started = Date.now();
    context.on('requestfinished', (request) => {
      if (Date.now() - started > 30_000 || !new URL(request.url()).pathname.endsWith('.js')) return;
      void request.sizes().then((s) => (jsBytes += s.responseBodySize + s.responseHeadersSize));
    });
    await page.goto(`${BASE}/sign-in`, { waitUntil: 'commit' });
    await page.getByLabel('E-mail').fill('interviewer@vellmoor.example');
    const formMs = Date.now() - started;
    await page.getByLabel('Password').fill('plumbline-demo');
    const tapped = Date.now();
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: 'Log a contact for Vellmoor tram extension' }).click({ trial: true, timeout: 60_000 });
    const logMs = Date.now() - tapped;
    await page.waitForTimeout(Math.max(0, 30_000 - (Date.now() - started)));
    return { formMs, logMs, jsBytes };
  } finally {
    await close();
  }
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)] as number;

async function main(): Promise<void> {
  const url = databaseUrl();
  await migrateLatest(url);
  execFileSync(process.execPath, [join(root, 'api/dist/demo/seed.js')], { env: { ...process.env, DATABASE_URL: url }, stdio: 'inherit' });
  const server = spawn(process.execPath, [join(root, 'api/dist/main.js')], {
    env: { ...process.env, DATABASE_URL: url, PORT: String(PORT), HOST: '127.0.0.1', PWA_DIST: join(root, 'pwa/dist'), JWT_SECRET: 'bench-secret-0123456789abcdefghijklmnop', LOG_LEVEL: 'warn', SMTP_URL: NO_MAIL },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  try {
    for (let i = 0; i < 100; i++) {
      if (await fetch(`${BASE}/api/health`).then((r) => r.ok, () => false)) break;
      await new Promise((r) => setTimeout(r, 200));
    }
    const runs = [];
    for (let i = 0; i < RUNS; i++) runs.push(await coldVisit());
    console.log(JSON.stringify({ runs }, null, 2));
    console.log(
      `median of ${RUNS} cold visits on slow 4G: sign-in form usable ${(median(runs.map((r) => r.formMs)) / 1000).toFixed(2)} s; ` +
        `"Log a contact" usable ${(median(runs.map((r) => r.logMs)) / 1000).toFixed(2)} s after tapping Sign in; ` +
        `${(median(runs.map((r) => r.jsBytes)) / 1024).toFixed(1)} KB of JavaScript transferred in 30 s`,
    );
  } finally {
    server.kill('SIGTERM');
  }
}

await main();
