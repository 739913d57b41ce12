// Looks at the built app in Debian's chromium with the API answered by the browser itself
// (demo-like data), and saves screenshots to /screenshots at phone and desktop sizes. Also
// checks that the app shell opens offline once the service worker has taken over.
//   npm run build -w pwa && node pwa/scripts/capture-screens.mjs
// With --real-api the preview server proxies /api to a running API on 127.0.0.1:3000 instead.
import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const outDir = join(repoRoot, 'screenshots');
const realApi = process.argv.includes('--real-api');
const port = 4173;
const base = `http://127.0.0.1:${port}`;
mkdirSync(outDir, { recursive: true });

const org = { id: 'org-1', name: 'Vellmoor Social Research' };
const people = {
  interviewer: 'Ines Marr', supervisor: 'Sam Odell', lead: 'Lorna Quist', client: 'Colm Farrant', admin: 'Ada Brennock',
};
const user = (role) => ({ id: `u-${role}`, email: `${role}@vellmoor.example`, name: people[role], role, organisation: org });
const tokens = (role) => ({ accessToken: `a-${role}`, refreshToken: `r-${role}`, expiresIn: 900, user: user(role) });

async function fakeApi(route) {
  const url = new URL(route.request().url());
  const reply = (status, body) => route.fulfill({ status, contentType: 'application/json', body: JSON.stringify(body) });
  if (url.pathname === '/api/auth/login') {
    const { email, password } = route.request().postDataJSON();
    const role = email.split('@')[0];
    if (password !== 'plumbline-demo' || !people[role]) {
      return reply(401, { statusCode: 401, error: 'Unauthorized', message: 'Wrong e-mail or password.' });
    }
    return reply(200, tokens(role));
  }
  if (url.pathname === '/api/auth/logout') return route.fulfill({ status: 204 });
  if (url.pathname === '/api/projects') {
    return reply(200, [{ id: 'p1', name: 'Vellmoor tram extension', topic: 'Support for the proposed tram extension across Vellmoor county', fieldStart: '2026-03-02', fieldEnd: '2026-03-22', targetSize: 1200, status: 'fieldwork' }]);
  }
  if (url.pathname === '/api/users') {
    return reply(200, Object.keys(people).map((role) => ({ ...user(role), createdAt: '2026-02-01T09:00:00Z' })));
  }
  return reply(404, { statusCode: 404, error: 'Not Found', message: 'Not found.' });
}

const server = spawn(process.execPath, [join(repoRoot, 'node_modules/vite/bin/vite.js'), 'preview', '--config', 'pwa/vite.config.ts', '--port', String(port), '--strictPort', '--host', '127.0.0.1'], { cwd: repoRoot, stdio: 'ignore' });
const userDataDir = mkdtempSync(join(tmpdir(), 'plumbline-shots-'));
let context;
try {
  for (let i = 0; i < 50; i += 1) {
    try { if ((await fetch(base)).ok) break; } catch { /* not up yet */ }
    await new Promise((r) => setTimeout(r, 200));
  }
  context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: { width: 360, height: 640 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  if (!realApi) await context.route('**/api/**', fakeApi);
  const page = context.pages()[0] ?? (await context.newPage());
  const shot = async (name) => { await page.waitForTimeout(400); await page.screenshot({ path: join(outDir, `${name}.png`) }); console.log(`screenshots/${name}.png`); };
  const signIn = async (role) => {
    await page.goto(`${base}/sign-in`);
    await page.getByLabel('E-mail').fill(`${role}@vellmoor.example`);
    await page.getByLabel('Password').fill('plumbline-demo');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 1 }).first().waitFor();
  };
  const signOut = async () => {
    const wide = (page.viewportSize()?.width ?? 0) >= 900;
    if (!wide) await page.getByRole('button', { name: /^Account:/ }).click();
    await page.getByRole('button', { name: 'Sign out' }).first().click();
    await page.getByRole('dialog', { name: 'Sign out of Plumbline?' }).getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
  };

  await page.goto(`${base}/`);
  await page.getByRole('heading', { level: 1, name: 'Sign in' }).waitFor();
  await shot('phone-sign-in');
  await page.getByLabel('E-mail').fill('lead@vellmoor.example');
  await page.getByLabel('Password').fill('wrong');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('alert').waitFor();
  await shot('phone-sign-in-wrong-password');

  for (const role of ['interviewer', 'supervisor', 'lead', 'client', 'admin']) {
    await signIn(role);
    await shot(`phone-${role}-home`);
    if (role === 'interviewer') {
      await page.getByRole('link', { name: 'Outbox' }).click();
      await shot('phone-interviewer-outbox');
      await page.getByRole('button', { name: /^Account:/ }).click();
      await shot('phone-account-sheet');
      await page.keyboard.press('Escape');
    }
    await signOut();
  }

  await page.setViewportSize({ width: 1280, height: 800 });
  await page.goto(`${base}/sign-in`);
  await shot('desktop-sign-in');
  await signIn('lead');
  await shot('desktop-lead-home');
  await signOut();
  await signIn('admin');
  await shot('desktop-admin-home');

  // Offline: the service worker must serve the shell after this online visit.
  await page.evaluate(() => navigator.serviceWorker.ready);
  await page.reload();
  await context.setOffline(true);
  await page.reload();
  await page.getByRole('heading', { level: 1 }).first().waitFor();
  await shot('desktop-offline-reload');
  await page.setViewportSize({ width: 360, height: 640 });
  await shot('phone-offline-reload');
  console.log('offline reload: shell loaded');
} finally {
  await context?.close();
  server.kill();
  rmSync(userDataDir, { recursive: true, force: true });
}
