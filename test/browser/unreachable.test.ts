// The device's own knowledge of the network, in Chromium at phone size: the page is
// reloaded with the network cut (after which Chromium may claim to be online), the outage
// lasts 90 s, and the browser's `online` event is swallowed, so only real requests can tell
// the app the office is back. And a contact half logged survives a reload.
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { logComplete, RESPONDENTS, waitForServiceWorker } from './fieldwork-steps.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

const OUTAGE_MS = 90_000;

describe('an office out of reach while the phone claims to be online', () => {
  it('says so within 10 s, keeps the work through a 90 s outage and sends it within 15 s of the network returning', { timeout: 240_000 }, async () => {
    browser = await openBrowser(PHONE);
    const { page, context } = browser;
    // No `online` event reaches the app: it must learn from its own requests.
    await context.addInitScript(() => {
      window.addEventListener('online', (event) => event.stopImmediatePropagation(), true);
    });
    await signIn(page, baseUrl, 'interviewer@vellmoor.example');
    await page.waitForURL(`${baseUrl}/interviewer`);
    await page.getByText('Cells as of the sync').waitFor();
    await waitForServiceWorker(page);

    await context.setOffline(true);
    const cutAt = Date.now();
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Today' }).waitFor();
    const reloadedAt = Date.now();
    const claimsOnline = await page.evaluate(() => navigator.onLine);
    const indicator = page.getByRole('status').filter({ hasText: /^Offline$/ });
    await indicator.waitFor({ timeout: 10_000 });
    expect(Date.now() - reloadedAt).toBeLessThan(10_000);
    const strip = page.getByRole('status').filter({ hasText: 'Office not reachable' });
    expect(await strip.textContent()).toMatch(/since \d\d:\d\d/);
    await screenshot(page, `unreachable-1-offline-indicator-${claimsOnline ? 'claims-online' : 'claims-offline'}`);

    const respondent = RESPONDENTS[2]!;
    await logComplete(page, respondent.categories, respondent.answer);
    await page.getByRole('radio', { name: respondent.answer }).click();
    await page.getByRole('button', { name: 'Save interview' }).click();
    await page.getByText('Complete saved on this device.').waitFor();
    await page.getByRole('link', { name: 'Outbox', exact: true }).click();
    await page.getByText('unsent interview on this device').waitFor();
    expect(await page.locator('.pl-outbox-number').textContent()).toBe('1');

    // A long outage: the device keeps trying, and says when it tries next.
    await page.waitForTimeout(Math.max(0, OUTAGE_MS - (Date.now() - cutAt)));
    expect(await indicator.isVisible()).toBe(true);
    expect(await strip.textContent()).toMatch(/next try in \d+ s|trying now/);
    expect(await page.locator('.pl-outbox-number').textContent()).toBe('1');
    await screenshot(page, 'unreachable-2-outbox-after-90s');

    await context.setOffline(false);
    const backAt = Date.now();
    await page.getByText('Nothing is waiting to be sent.').waitFor({ timeout: 15_000 });
    expect(Date.now() - backAt).toBeLessThan(15_000);
    await page.getByRole('status').filter({ hasText: /^Online$/ }).waitFor();
    await screenshot(page, 'unreachable-3-sent');
  });
});

describe('a contact half logged', () => {
  it('returns to the same step with the same answers after a reload', async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'interviewer@vellmoor.example');
    await page.getByText('Cells as of the sync').waitFor();

    const { categories } = RESPONDENTS[3]!;
    await page.getByRole('button', { name: 'Log a contact for Vellmoor tram extension' }).click();
    await page.getByRole('radio', { name: 'Complete', exact: true }).click();
    for (const [variable, category] of Object.entries(categories)) {
      await page.getByRole('radiogroup', { name: variable }).getByRole('radio', { name: category, exact: true }).click();
    }
    await page.reload();
    for (const [variable, category] of Object.entries(categories)) {
      // A chosen category's button carries a tick before its name.
      const name = new RegExp(`^(✓ )?${category.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`);
      const radio = page.getByRole('radiogroup', { name: variable }).getByRole('radio', { name });
      await radio.waitFor();
      expect(await radio.isChecked()).toBe(true);
    }
    await screenshot(page, 'draft-1-categories-after-reload');

    await page.getByRole('button', { name: 'Check their cells' }).click();
    await page.getByRole('button', { name: 'Start the interview' }).click();
    await page.getByRole('radio', { name: 'No', exact: true }).click();
    await page.reload();
    const no = page.getByRole('radio', { name: /^(✓ )?No$/ });
    await no.waitFor();
    expect(await no.isChecked()).toBe(true);
    await screenshot(page, 'draft-2-answer-after-reload');

    await page.getByRole('button', { name: 'Save interview' }).click();
    await page.getByText('Complete saved on this device.').waitFor();
  });
});
