// The office screens in Chromium against the seeded demo (invented Vellmoor agency):
// the supervisor's quota board, the lead's balance and project set-up, the client's progress.
import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { DEMO_PASSWORD, DESKTOP, openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

async function apiAs<T>(email: string, path: string): Promise<T> {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const response = await fetch(`${baseUrl}/api${path}`, { headers: { Authorization: `Bearer ${accessToken}` } });
  return (await response.json()) as T;
}

async function tramProjectId(): Promise<string> {
  const projects = await apiAs<{ id: string; name: string }[]>('lead@vellmoor.example', '/projects');
  return projects.find((p) => p.name === 'Vellmoor tram extension')!.id;
}

/** The figure shown under a term in one of the balance page's figure groups. */
function figure(page: Page, group: string, term: string) {
  return page.locator(`dl[aria-label="${group}"] > div`, { has: page.locator('dt', { hasText: term }) }).locator('dd');
}

const cellLabel = 'Age band: 18-24 × Sex: female';

describe("supervisor's quota board", () => {
  it('shows the seeded cells on a phone and closes and reopens a cell after confirmation', async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'supervisor@vellmoor.example');
    await page.waitForURL(`${baseUrl}/supervisor`);
    const list = page.getByRole('list', { name: 'Cells' });
    await list.waitFor();
    const board = await apiAs<{ cells: { label: string }[] }>('supervisor@vellmoor.example', `/projects/${await tramProjectId()}/quota-board`);
    expect(await list.getByRole('listitem').count()).toBe(board.cells.length);
    await list.getByText('Region: Harrowby').waitFor();
    await screenshot(page, 'phone-supervisor-board');

    await page.getByRole('button', { name: `Close cell ${cellLabel}` }).click();
    const dialog = page.getByRole('dialog', { name: 'Close this cell?' });
    await dialog.waitFor();
    await screenshot(page, 'phone-supervisor-close-dialog');
    await dialog.getByRole('button', { name: 'Close cell' }).click();
    const item = list.getByRole('listitem').filter({ hasText: cellLabel });
    await item.getByText('Closed', { exact: true }).waitFor();
    await page.getByRole('button', { name: `Reopen cell ${cellLabel}` }).waitFor();

    await page.getByRole('button', { name: `Reopen cell ${cellLabel}` }).click();
    await page.getByRole('dialog', { name: 'Reopen this cell?' }).getByRole('button', { name: 'Reopen cell' }).click();
    await page.getByRole('button', { name: `Close cell ${cellLabel}` }).waitFor();
    expect(await item.getByText('Closed', { exact: true }).count()).toBe(0);
  });

  it('sorts the table on a desktop', async () => {
    browser = await openBrowser(DESKTOP);
    const { page } = browser;
    await signIn(page, baseUrl, 'supervisor@vellmoor.example');
    const table = page.getByRole('table', { name: 'Cells' });
    await table.waitFor();
    await page.getByRole('button', { name: /^Remaining/ }).click();
    await page.getByRole('button', { name: /^Remaining/ }).click();
    const remaining = await table.locator('tbody tr td:nth-of-type(3)').allTextContents();
    const numbers = remaining.map((text) => Number(text.replace(/,/g, '')));
    expect(numbers.length).toBeGreaterThan(10);
    expect(numbers).toEqual([...numbers].sort((a, b) => b - a));
    await screenshot(page, 'desktop-supervisor-board');
  });
});

interface BalanceBody {
  designEffect: number;
  effectiveSampleSize: number;
  outcome: { unweighted: number; weighted: number; interval: [number, number]; marginOfError: number; impliedBiasFactor: number; impliedBiasFactorInterval: [number, number] };
}

describe("lead's balance", () => {
  it('shows the design effect and implied bias factor that GET /balance reports', async () => {
    const balance = await apiAs<BalanceBody>('lead@vellmoor.example', `/projects/${await tramProjectId()}/balance`);
    browser = await openBrowser(DESKTOP);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.waitForURL(`${baseUrl}/lead`);
    await page.getByRole('link', { name: 'Balance' }).click();
    await figure(page, 'Weighting figures', 'Design effect').waitFor();

    expect(await figure(page, 'Weighting figures', 'Design effect').textContent()).toBe(balance.designEffect.toFixed(2));
    expect(await figure(page, 'Weighting figures', 'Effective sample size').textContent()).toBe(String(Math.round(balance.effectiveSampleSize)));
    const [lower, upper] = balance.outcome.interval;
    expect(await figure(page, 'Weighting figures', 'Weighted share, 95% interval').textContent())
      .toBe(`${(lower * 100).toFixed(1)}% – ${(upper * 100).toFixed(1)}%`);
    // The demo's headline share is near one half, where the interval is near symmetric and a ± is shown.
    expect(await figure(page, 'Weighting figures', 'Margin of error (95%)').textContent()).toBe(`±${(((upper - lower) / 2) * 100).toFixed(1)} pts`);
    expect(await figure(page, 'Headline figures', 'Implied bias factor').textContent()).toBe(balance.outcome.impliedBiasFactor.toFixed(3));
    const [low, high] = balance.outcome.impliedBiasFactorInterval;
    expect(await figure(page, 'Headline figures', 'Its 95% interval').textContent()).toBe(`${low.toFixed(3)} – ${high.toFixed(3)}`);
    expect(await figure(page, 'Headline figures', 'Yes, weighted').textContent()).toBe(`${(balance.outcome.weighted * 100).toFixed(1)}%`);
    await page.getByText(/not a sampling guarantee/).waitFor();
    await screenshot(page, 'desktop-lead-balance');
  });

  it('shows the client the same figures read-only on a phone', async () => {
    const balance = await apiAs<BalanceBody>('client@vellmoor.example', `/projects/${await tramProjectId()}/balance`);
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'client@vellmoor.example');
    await page.waitForURL(`${baseUrl}/client`);
    await figure(page, 'Headline figures', 'Implied bias factor').waitFor();
    expect(await figure(page, 'Headline figures', 'Implied bias factor').textContent()).toBe(balance.outcome.impliedBiasFactor.toFixed(3));
    expect(await page.getByRole('button', { name: /save|close cell|export|download/i }).count()).toBe(0);
    await screenshot(page, 'phone-client-progress');
  });
});

describe('lead sets up a project', () => {
  it('creates a project, refuses a bad targets file by its line, then saves a good one interlocked and shows the cells', async () => {
    browser = await openBrowser(DESKTOP);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.getByRole('link', { name: 'New project' }).click();
    await page.getByLabel('Project name').fill('Kestle Vale evening buses');
    await page.getByLabel('Field start').fill('2027-01-11');
    await page.getByLabel('Field end').fill('2027-01-31');
    await page.getByLabel('Target sample size').fill('300');
    await page.getByLabel('Headline question').fill('Would you use an hourly evening bus?');
    await page.getByRole('button', { name: 'Create project' }).click();
    await page.getByRole('heading', { level: 1, name: 'Kestle Vale evening buses' }).waitFor();

    const fileInput = page.getByLabel('Targets file (CSV: variable,category,share)');
    await fileInput.setInputFiles({ name: 'buses.csv', mimeType: 'text/csv', buffer: Buffer.from('variable,category,share\nage_band,18-34,lots\n') });
    await page.getByRole('button', { name: 'Read file' }).click();
    await page.getByRole('alert').filter({ hasText: 'buses.csv: line 2' }).waitFor();

    const csv = ['variable;category;share', 'age_band;18-34;30', 'age_band;35-54;35', 'age_band;55+;35', 'sex;female;51', 'sex;male;49', 'region;North;40', 'region;South;60'];
    await fileInput.setInputFiles({ name: 'buses.csv', mimeType: 'text/csv', buffer: Buffer.from(`\uFEFF${csv.join('\n')}\n`) });
    await page.getByRole('button', { name: 'Read file' }).click();
    await page.getByText(/Read from buses\.csv: 3 variables\. Nothing is saved yet/).waitFor();
    await page.getByLabel('Interlock age_band').check();
    await page.getByLabel('Interlock sex').check();
    await screenshot(page, 'desktop-lead-targets-review');
    await page.getByRole('button', { name: 'Save targets' }).click();
    const preview = page.getByRole('dialog', { name: 'Check the cell targets' });
    await preview.getByRole('table', { name: 'New cell targets' }).getByText('age_band: 18-34 × sex: female').waitFor();
    await screenshot(page, 'desktop-lead-cell-preview');
    await preview.getByRole('button', { name: 'Save these targets' }).click();
    await preview.waitFor({ state: 'hidden' });

    const cells = page.getByRole('table', { name: 'Cell targets', exact: true });
    await cells.getByText('age_band: 18-34 × sex: female').waitFor();
    const targets = await cells.locator('tbody tr td:nth-of-type(2)').allTextContents();
    expect(targets).toHaveLength(8);
    expect(targets.slice(0, 6).reduce((sum, t) => sum + Number(t), 0)).toBe(300);
    await cells.scrollIntoViewIfNeeded();
    await screenshot(page, 'desktop-lead-cells');
  });
});
