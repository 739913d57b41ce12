// Cheap polling in a real browser: when the quota board refreshes and nothing changed, the
// browser revalidates its stored answer with the API's ETag and the body does not travel again.
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, PHONE, signIn, type Browser } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

interface Transfer {
  transferSize: number;
  encodedBodySize: number;
}

describe('revalidated polling', () => {
  it('refreshes an unchanged quota board without moving its body again', async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'supervisor@vellmoor.example');
    await page.waitForURL(`${baseUrl}/supervisor`);
    await page.getByRole('list', { name: 'Cells' }).waitFor();

    const boardFetches = () =>
      page.evaluate(() =>
        performance
          .getEntriesByType('resource')
          .filter((e) => e.name.includes('/quota-board'))
          .map((e) => ({ transferSize: (e as PerformanceResourceTiming).transferSize, encodedBodySize: (e as PerformanceResourceTiming).encodedBodySize })),
      );
    const before = (await boardFetches()).length;
    // The board refetches when the page becomes visible again, as on a phone's return to the app.
    await page.evaluate(() => window.dispatchEvent(new Event('visibilitychange')));
    await expect.poll(async () => (await boardFetches()).length, { timeout: 10_000 }).toBeGreaterThan(before);

    const fetches: Transfer[] = await boardFetches();
    const first = fetches[0]!;
    const last = fetches.at(-1)!;
    // The first answer carried the whole board; the refresh only headers (a 304), same body.
    expect(first.transferSize).toBeGreaterThan(first.encodedBodySize);
    expect(last.encodedBodySize).toBe(first.encodedBodySize);
    expect(last.transferSize).toBeLessThan(last.encodedBodySize);
  });
});
