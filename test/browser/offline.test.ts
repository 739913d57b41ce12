import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { waitForServiceWorker } from './fieldwork-steps.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

describe('offline', () => {
  it('loads the shell from the service worker with the network cut, still signed in', async () => {
    browser = await openBrowser(PHONE);
    const { page, context } = browser;
    await signIn(page, baseUrl, 'interviewer@vellmoor.example');
    await page.waitForURL(`${baseUrl}/interviewer`);
    // The service worker must control the page and hold its files before the network goes.
    await waitForServiceWorker(page);
    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Today' }).first().waitFor();
    await page.getByText(/offline/i).first().waitFor();
    await screenshot(page, 'phone-interviewer-offline');
    expect(new URL(page.url()).pathname).toBe('/interviewer');
  });
});
