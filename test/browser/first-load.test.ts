// What an interviewer's phone downloads on its first visit: every script transferred in the
// first 30 s of a cold visit (sign-in page, signing in, the Today page), the service
// worker's own downloads included. The bytes are those on the wire (compressed), as the
// browser reports them. The figure goes in the README; the budget is the issue's.
import { writeFileSync, mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, PHONE, signIn, type Browser } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

const BUDGET_BYTES = 250 * 1024;
const WINDOW_MS = 30_000;

describe("an interviewer's first visit", () => {
  it('transfers under 250 KB of JavaScript in its first 30 s, none of it other roles’ pages', { timeout: 120_000 }, async () => {
    browser = await openBrowser(PHONE);
    const { page, context } = browser;
    const scripts: { url: string; bytes: number; byServiceWorker: boolean }[] = [];
    const pending: Promise<void>[] = [];
    const started = Date.now();
    context.on('requestfinished', (request) => {
      if (Date.now() - started > WINDOW_MS || !new URL(request.url()).pathname.endsWith('.js')) return;
      pending.push(
        request.sizes().then((sizes) => {
          const bytes = sizes.responseBodySize + sizes.responseHeadersSize;
          if (bytes > 0) scripts.push({ url: new URL(request.url()).pathname, bytes, byServiceWorker: request.serviceWorker() !== null });
        }),
      );
    });

    await signIn(page, baseUrl, 'interviewer@vellmoor.example');
    await page.getByRole('button', { name: 'Log a contact for Vellmoor tram extension' }).waitFor();
    await page.waitForTimeout(Math.max(0, WINDOW_MS - (Date.now() - started)));
    await Promise.all(pending);

    const total = scripts.reduce((sum, s) => sum + s.bytes, 0);
    const report = { totalBytes: total, files: scripts.sort((a, b) => b.bytes - a.bytes) };
    const out = resolve(import.meta.dirname, '../../.data/measurements');
    mkdirSync(out, { recursive: true });
    writeFileSync(join(out, 'first-load-interviewer.json'), JSON.stringify(report, null, 2));
    console.log(`interviewer first visit: ${(total / 1024).toFixed(1)} KB of JavaScript in ${scripts.length} transfers`);

    expect(scripts.some((s) => s.url.includes('interviewer-pages'))).toBe(true);
    expect(scripts.filter((s) => /supervisor-pages|lead-pages|admin-pages|project-balance|project-page/.test(s.url))).toEqual([]);
    expect(total).toBeLessThan(BUDGET_BYTES);
  });
});
