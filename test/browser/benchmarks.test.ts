// The lead's Benchmarks page on the demo project: the three invented published polls of the
// seed (two method groups), the reconciled share with the project's own figure, and the
// cautions, at phone and desktop size, with screenshots; a poll recorded and removed on the phone.
import { afterEach, describe, expect, inject, it } from 'vitest';
import { DESKTOP, openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { checkPage } from './page-checks.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

async function openBenchmarks(viewport: typeof PHONE) {
  browser = await openBrowser(viewport);
  const { page } = browser;
  await signIn(page, baseUrl, 'lead@vellmoor.example');
  await page.waitForURL(`${baseUrl}/lead`);
  await page.goto(`${baseUrl}/lead/benchmarks`);
  const picker = page.getByRole('combobox', { name: 'Project', exact: true });
  if (await picker.count()) await picker.selectOption({ label: 'Vellmoor tram extension' });
  await page.getByText('Likely true share').waitFor();
  return page;
}

describe("the lead's benchmarks page", () => {
  it.each([['phone', PHONE], ['desktop', DESKTOP]] as const)('shows the demo polls and the reconciliation at %s size', async (name, viewport) => {
    const page = await openBenchmarks(viewport);
    for (const source of ['Vellmoor Courier / Harrow Polling', 'Eastline Panel, wave 1', 'Eastline Panel, wave 2']) {
      await page.getByRole('heading', { name: source }).waitFor();
    }
    const groups = page.getByRole('table', { name: 'Bias factor of each method group' });
    await groups.getByRole('row', { name: /This project \(weighted\)/ }).waitFor();
    expect(await groups.getByRole('row').count()).toBe(4);
    expect(await page.getByRole('table', { name: 'Chance-outlier probability of each poll' }).getByRole('row').count()).toBe(5);
    expect(await page.getByRole('region', { name: 'Read the reconciliation with care' }).textContent()).toMatch(/only as good as the assumption/);
    expect(await checkPage(page, `benchmarks-${name}`)).toEqual([]);
    await screenshot(page, `benchmarks-${name}`);
  });

  it('records a poll on the phone and removes it again', async () => {
    const page = await openBenchmarks(PHONE);
    await page.getByRole('button', { name: 'Record another poll' }).click();
    const form = page.getByRole('form', { name: 'Record another poll' });
    await form.getByLabel('Source').fill('Harbour Gazette street poll');
    await form.getByLabel('Field start').fill('2026-11-20');
    await form.getByLabel('Field end').fill('2026-11-21');
    await form.getByLabel('Yes (%)').fill('51');
    await form.getByLabel('Sample size').fill('400');
    await form.getByLabel('Method group').fill('Street intercept');
    await screenshot(page, 'benchmarks-form-phone');
    await form.getByRole('button', { name: 'Record the poll' }).click();
    await page.getByRole('heading', { name: 'Harbour Gazette street poll' }).waitFor();
    await page.getByRole('table', { name: 'Bias factor of each method group' }).getByRole('row', { name: /Street intercept/ }).waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    await page.getByRole('button', { name: 'Remove Harbour Gazette street poll' }).click();
    await page.getByRole('heading', { name: 'Harbour Gazette street poll' }).waitFor({ state: 'detached' });
  });

  it("shows the client the same reconciliation read-only on the phone", async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'client@vellmoor.example');
    await page.waitForURL(`${baseUrl}/client`);
    await page.getByRole('link', { name: 'Other polls' }).click();
    await page.getByText('Likely true share').waitFor();
    await page.getByRole('table', { name: 'Bias factor of each method group' }).getByRole('row', { name: /Online panel/ }).waitFor();
    expect(await page.getByRole('region', { name: 'Read the reconciliation with care' }).textContent()).toMatch(/only as good as the assumption/);
    expect(await page.getByLabel('Spread prior of an unknown bias').count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Record another poll' }).count()).toBe(0);
    await screenshot(page, 'benchmarks-client-phone');
  });
});
