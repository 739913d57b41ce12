// The interviewer's offline loop in Chromium at phone size, against the built app and API:
// contacts logged with the network cut survive a reload and reach the office once it is back;
// a respondent in a closed cell is warned about before the interview and counted over quota.
import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { DEMO_PASSWORD, openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

async function tokenFor(email: string): Promise<{ token: string; userId: string }> {
  const response = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  const body = (await response.json()) as { accessToken: string; user: { id: string } };
  return { token: body.accessToken, userId: body.user.id };
}

async function api<T>(token: string, path: string, method = 'GET'): Promise<T> {
  const response = await fetch(`${baseUrl}/api${path}`, { method, headers: { Authorization: `Bearer ${token}` } });
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}`);
  return (await response.json()) as T;
}

interface Board {
  cells: { id: string; label: string; overQuota: number; status: string }[];
  interviewers: { id: string; completesTotal: number }[];
}

async function vellmoorId(token: string): Promise<string> {
  const projects = await api<{ id: string; name: string }[]>(token, '/projects');
  return projects.find((p) => p.name === 'Vellmoor tram extension')!.id;
}

/** Waits until the service worker controls the page, so a reload works without network. */
async function waitForServiceWorker(page: Page): Promise<void> {
  await page.waitForFunction(async () => {
    const registration = await navigator.serviceWorker.ready;
    return Boolean(registration.active && navigator.serviceWorker.controller);
  });
}

/** Logs one complete through the screen: outcome, categories, cell check, headline answer. */
async function logComplete(page: Page, categories: Record<string, string>, answer: 'Yes' | 'No', shotPrefix?: string) {
  await page.getByRole('button', { name: 'Log a contact for Vellmoor tram extension' }).click();
  if (shotPrefix) await screenshot(page, `${shotPrefix}-outcome`);
  await page.getByRole('button', { name: 'Complete', exact: true }).click();
  for (const [variable, category] of Object.entries(categories)) {
    await page.getByRole('radiogroup', { name: variable }).getByRole('radio', { name: category, exact: true }).click();
  }
  if (shotPrefix) await screenshot(page, `${shotPrefix}-categories`);
  await page.getByRole('button', { name: 'Check their cells' }).click();
  await page.getByRole('heading', { name: 'Their cells' }).waitFor();
  if (shotPrefix) await screenshot(page, `${shotPrefix}-cells`);
  await page.getByRole('button', { name: 'Start the interview' }).click();
}

async function answerAndSave(page: Page, answer: 'Yes' | 'No', shotPrefix?: string) {
  await page.getByRole('radio', { name: answer }).click();
  if (shotPrefix) await screenshot(page, `${shotPrefix}-answer`);
  await page.getByRole('button', { name: 'Save interview' }).click();
  await page.getByText('Complete saved on this device.').waitFor();
}

// Respondents whose cells the seeded demo leaves open (the demo's sample is short of young
// men, basic education and the outlying regions), so no full-cell question interrupts.
const RESPONDENTS: { categories: Record<string, string>; answer: 'Yes' | 'No' }[] = [
  { categories: { 'Age band': '18-24', Sex: 'male', Region: 'Mardon', Education: 'basic' }, answer: 'Yes' },
  { categories: { 'Age band': '25-34', Sex: 'female', Region: 'Old Quay', Education: 'secondary' }, answer: 'No' },
  { categories: { 'Age band': '35-44', Sex: 'male', Region: 'Tarnholm', Education: 'vocational' }, answer: 'Yes' },
  { categories: { 'Age band': '25-34', Sex: 'male', Region: 'Kestle Vale', Education: 'basic' }, answer: 'No' },
  { categories: { 'Age band': '45-54', Sex: 'male', Region: 'Mardon', Education: 'secondary' }, answer: 'Yes' },
];

describe('interviewer offline at phone size', () => {
  it('keeps five interviews logged offline across a reload and delivers them when the network returns', async () => {
    const supervisor = await tokenFor('supervisor@vellmoor.example');
    const lead = await tokenFor('lead@vellmoor.example');
    const interviewer = await tokenFor('interviewer@vellmoor.example');
    const projectId = await vellmoorId(lead.token);
    const completesOf = (board: Board) => board.interviewers.find((i) => i.id === interviewer.userId)?.completesTotal ?? 0;
    const boardBefore = await api<Board>(supervisor.token, `/projects/${projectId}/quota-board`);
    const balanceBefore = await api<{ n: number }>(lead.token, `/projects/${projectId}/balance`);

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
    await page.getByText('5 contacts waiting in the outbox').waitFor();

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

    const boardAfter = await api<Board>(supervisor.token, `/projects/${projectId}/quota-board`);
    const balanceAfter = await api<{ n: number }>(lead.token, `/projects/${projectId}/balance`);
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
    const supervisor = await tokenFor('supervisor@vellmoor.example');
    const projectId = await vellmoorId(supervisor.token);
    const board = await api<Board>(supervisor.token, `/projects/${projectId}/quota-board`);
    const cell = board.cells.find((c) => c.label === 'age band: 18-24 × sex: female')!;
    await api(supervisor.token, `/projects/${projectId}/cells/${cell.id}/close`, 'POST');
    try {
      browser = await openBrowser(PHONE);
      const { page } = browser;
      await signIn(page, baseUrl, 'interviewer@vellmoor.example');
      await page.getByText('Cells as of the sync').waitFor();
      await screenshot(page, 'interviewer-6-today-closed-cell');
      await page.getByRole('link', { name: 'Cells', exact: true }).click();
      await page.getByRole('heading', { level: 1, name: 'Today' }).waitFor({ state: 'hidden' });
      const closedRow = page.getByRole('region', { name: 'Crossed cells' }).getByRole('listitem').filter({ hasText: '18-24 × sex: female' });
      expect(await closedRow.textContent()).toContain('Closed');
      await screenshot(page, 'interviewer-6-cells-page');
      await page.getByRole('link', { name: 'Today', exact: true }).click();
      await page.getByRole('heading', { level: 1, name: 'Cells' }).waitFor({ state: 'hidden' });

      await logComplete(page, { 'Age band': '18-24', Sex: 'female', Region: 'Harrowby', Education: 'degree' }, 'No');
      const warning = page.getByRole('dialog', { name: 'Interview in a full cell?' });
      await warning.waitFor();
      expect(await warning.textContent()).toContain('age band: 18-24 × sex: female is closed');
      expect(await page.getByRole('alert').first().textContent()).toContain('full or closed');
      await screenshot(page, 'interviewer-7-closed-cell-warning');
      await warning.getByRole('button', { name: 'Interview anyway' }).click();
      await answerAndSave(page, 'No');

      await page.getByRole('link', { name: 'Outbox', exact: true }).click();
      await page.getByText('Nothing is waiting to be sent.').waitFor();
      const after = await api<Board>(supervisor.token, `/projects/${projectId}/quota-board`);
      expect(after.cells.find((c) => c.id === cell.id)!.overQuota).toBe(cell.overQuota + 1);
    } finally {
      await api(supervisor.token, `/projects/${projectId}/cells/${cell.id}/reopen`, 'POST');
    }
  });
});
