// The interviewer's offline loop in Chromium at phone size, against the built app and API:
// contacts logged with the network cut survive a reload and reach the office once it is back;
// a respondent in a closed cell is warned about before the interview and counted over quota.
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { answerAndSave, api, logComplete, RESPONDENTS, tokenFor, vellmoorId, waitForServiceWorker, type Board } from './fieldwork-steps.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

describe('interviewer offline at phone size', () => {
  it('keeps five interviews logged offline across a reload and delivers them when the network returns', async () => {
    const supervisor = await tokenFor(baseUrl, 'supervisor@vellmoor.example');
    const lead = await tokenFor(baseUrl, 'lead@vellmoor.example');
    const interviewer = await tokenFor(baseUrl, 'interviewer@vellmoor.example');
    const projectId = await vellmoorId(baseUrl, lead.token);
    const completesOf = (board: Board) => board.interviewers.find((i) => i.id === interviewer.userId)?.completesTotal ?? 0;
    const boardBefore = await api<Board>(baseUrl, supervisor.token, `/projects/${projectId}/quota-board`);
    const balanceBefore = await api<{ n: number }>(baseUrl, lead.token, `/projects/${projectId}/balance`);

    browser = await openBrowser(PHONE);
    const { page, context } = browser;
    await signIn(page, baseUrl, 'interviewer@vellmoor.example');
    await page.waitForURL(`${baseUrl}/interviewer`);
    await page.getByText('Cells as of the sync').waitFor(); // the first sync filled the device's caches
    await waitForServiceWorker(page);
    await screenshot(page, 'interviewer-1-today-online');

    await context.setOffline(true);
    await page.getByText('Offline', { exact: true }).waitFor();
    for (const [index, respondent] of RESPONDENTS.entries()) {
      const shots = index === 0 ? 'interviewer-2-log' : undefined;
      await logComplete(page, respondent.categories, respondent.answer, shots);
      await answerAndSave(page, respondent.answer, shots);
    }
    await screenshot(page, 'interviewer-3-today-five-waiting');
    await page.getByText('5 unsent interviews in the outbox').waitFor();

    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Today' }).waitFor();
    await page.getByRole('link', { name: 'Outbox', exact: true }).click();
    await page.getByText('unsent interviews on this device').waitFor();
    await page.getByRole('heading', { level: 1, name: 'Today' }).waitFor({ state: 'hidden' });
    const waiting = page.getByRole('list', { name: 'Waiting to be sent' }).getByRole('listitem');
    expect(await waiting.count()).toBe(5);
    expect(await page.locator('.pl-outbox-number').textContent()).toBe('5');
    await screenshot(page, 'interviewer-4-outbox-offline-after-reload');

    await context.setOffline(false);
    await page.getByText('Nothing is waiting to be sent.').waitFor();
    expect(await page.locator('.pl-outbox-number').textContent()).toBe('0');
    await screenshot(page, 'interviewer-5-outbox-sent');

    const boardAfter = await api<Board>(baseUrl, supervisor.token, `/projects/${projectId}/quota-board`);
    const balanceAfter = await api<{ n: number }>(baseUrl, lead.token, `/projects/${projectId}/balance`);
    expect(completesOf(boardAfter)).toBe(completesOf(boardBefore) + 5);
    expect(balanceAfter.n).toBe(balanceBefore.n + 5);
    await browser.close();

    // The supervisor sees the five on the quota board; the lead sees the balance move.
    browser = await openBrowser(PHONE);
    await signIn(browser.page, baseUrl, 'supervisor@vellmoor.example');
    const row = browser.page.getByRole('table', { name: 'Interviewers' }).getByRole('row', { name: /Owen Marsh/ });
    await row.waitFor();
    expect(await row.getByRole('cell').nth(1).textContent()).toBe(String(completesOf(boardBefore) + 5));
    await screenshot(browser.page, 'interviewer-5b-supervisor-board');
    await browser.close();
    browser = await openBrowser(PHONE);
    await signIn(browser.page, baseUrl, 'lead@vellmoor.example');
    await browser.page.waitForURL(`${baseUrl}/lead`);
    await browser.page.getByRole('link', { name: 'Balance', exact: true }).click();
    const counted = `${(balanceBefore.n + 5).toLocaleString('en-GB')} of 1,200 completes counted`;
    await browser.page.getByText(counted).waitFor();
    await screenshot(browser.page, 'interviewer-5c-lead-balance');
  });

  it('warns before an interview in a closed cell, and the office sees it over quota', async () => {
    const supervisor = await tokenFor(baseUrl, 'supervisor@vellmoor.example');
    const projectId = await vellmoorId(baseUrl, supervisor.token);
    const board = await api<Board>(baseUrl, supervisor.token, `/projects/${projectId}/quota-board`);
    const cell = board.cells.find((c) => c.label === 'Age band: 18-24 × Sex: female')!;
    await api(baseUrl, supervisor.token, `/projects/${projectId}/cells/${cell.id}/close`, 'POST');
    try {
      browser = await openBrowser(PHONE);
      const { page } = browser;
      await signIn(page, baseUrl, 'interviewer@vellmoor.example');
      await page.getByText('Cells as of the sync').waitFor();
      await screenshot(page, 'interviewer-6-today-closed-cell');
      await page.getByRole('link', { name: 'Cells', exact: true }).click();
      await page.getByRole('heading', { level: 1, name: 'Today' }).waitFor({ state: 'hidden' });
      const closedRow = page.getByRole('region', { name: 'Interlocked cells' }).getByRole('listitem').filter({ hasText: '18-24 × Sex: female' });
      expect(await closedRow.textContent()).toContain('Closed');
      await screenshot(page, 'interviewer-6-cells-page');
      await page.getByRole('link', { name: 'Today', exact: true }).click();
      await page.getByRole('heading', { level: 1, name: 'Cells' }).waitFor({ state: 'hidden' });

      await logComplete(page, { 'Age band': '18-24', Sex: 'female', Region: 'Harrowby', Education: 'degree' }, 'No');
      const warning = page.getByRole('dialog', { name: 'Their cell is closed' });
      await warning.waitFor();
      expect(await warning.textContent()).toContain('Age band: 18-24 × Sex: female is closed');
      expect(await page.getByRole('alert').first().textContent()).toContain('full or closed');
      await screenshot(page, 'interviewer-7-closed-cell-warning');
      await warning.getByRole('button', { name: 'Interview anyway' }).click();
      await answerAndSave(page, 'No');

      await page.getByRole('link', { name: 'Outbox', exact: true }).click();
      await page.getByText('Nothing is waiting to be sent.').waitFor();
      const after = await api<Board>(baseUrl, supervisor.token, `/projects/${projectId}/quota-board`);
      expect(after.cells.find((c) => c.id === cell.id)!.overQuota).toBe(cell.overQuota + 1);
    } finally {
      await api(baseUrl, supervisor.token, `/projects/${projectId}/cells/${cell.id}/reopen`, 'POST');
    }
  });
});
