// Per-interviewer assignments in Chromium against the seeded demo (invented Vellmoor agency):
// the lead gives Alys Fenwick a target and a cell on the project page; her Today page, on a
// 360×640 phone, shows her completes against it and how her cell stands.
import { afterEach, describe, expect, inject, it } from 'vitest';
import { DESKTOP, openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { api, tokenFor, vellmoorId } from './fieldwork-steps.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

describe('per-interviewer assignments', () => {
  it('the lead sets one and the interviewer’s Today shows it on a phone', async () => {
    const lead = await tokenFor(baseUrl, 'lead@vellmoor.example');
    const alys = await tokenFor(baseUrl, 'a.fenwick@vellmoor.example');
    const projectId = await vellmoorId(baseUrl, lead.token);
    // Her counted completes so far, as the server has them, for the figure on her phone.
    const mine = (await api<{ id: string; mine: { completes: number } }[]>(baseUrl, alys.token, '/projects')).find((p) => p.id === projectId)!.mine;

    browser = await openBrowser(DESKTOP);
    await signIn(browser.page, baseUrl, 'lead@vellmoor.example');
    await browser.page.waitForURL(`${baseUrl}/lead`);
    await browser.page.goto(`${baseUrl}/lead/projects/${projectId}`);
    const list = browser.page.getByRole('list', { name: 'Assignments' });
    await list.getByRole('button', { name: 'Set the assignment of Alys Fenwick' }).click();
    const form = browser.page.getByRole('form', { name: 'Assignment of Alys Fenwick' });
    await form.getByLabel('Completes to reach').fill('150');
    await form.getByRole('checkbox', { name: /^Age band: 18-24 × Sex: female$/ }).check();
    await form.getByRole('button', { name: 'Save assignment' }).click();
    await list.getByRole('listitem').filter({ hasText: 'Alys Fenwick' }).getByText(/of 150 completes; cells: Age band: 18-24 × Sex: female/).waitFor();
    await screenshot(browser.page, 'desktop-lead-assignment');
    await browser.close();

    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'a.fenwick@vellmoor.example');
    await page.waitForURL(`${baseUrl}/interviewer`);
    const work = page.getByRole('region', { name: 'Your work' });
    await work.getByText(`${mine.completes} of 150 completes`).waitFor();
    const cells = work.getByRole('list', { name: 'Your cells on Vellmoor tram extension' });
    await cells.getByText('Age band: 18-24 × Sex: female').waitFor();
    expect(await cells.getByRole('listitem').count()).toBe(1);
    expect(await work.getByText(/^Today: \d+ contacts?, \d+ completes?$/).count()).toBe(1);
    await work.scrollIntoViewIfNeeded();
    await screenshot(page, 'phone-interviewer-today-assignment');
    // Nothing on the page is wider than the phone.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(360);

    // Leave the demo as it was for the other suites.
    const cleared = await fetch(`${baseUrl}/api/projects/${projectId}/assignments/${alys.userId}`, { method: 'DELETE', headers: { Authorization: `Bearer ${lead.token}` } });
    expect(cleared.status).toBe(204);
  });
});
