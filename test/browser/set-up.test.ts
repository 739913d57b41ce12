// The lead's set-up at phone size: shares keep one scale from a file through saving, a reload
// and an edit, every cell target is shown before it is saved, and stage changes ask first.
import type { Locator } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { api, tokenFor } from './fieldwork-steps.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

/** A project in set-up with 200 interviews to share out, made through the API. */
async function newProject(name: string): Promise<string> {
  const { token } = await tokenFor(baseUrl, 'lead@vellmoor.example');
  const created = await api<{ id: string }>(baseUrl, token, '/projects', 'POST', {
    name,
    fieldStart: '2027-02-01',
    fieldEnd: '2027-02-20',
    targetSize: 200,
    headlineQuestion: 'Should the Harbour ferry run on Sundays?',
    timeZone: 'Europe/London',
  });
  return created.id;
}

/** The New target and Achieved columns of the preview, or Target and Achieved of the saved cells, by cell. */
async function targetsIn(table: Locator, column: number): Promise<Record<string, string>> {
  const rows = await table.locator('tbody tr').all();
  const out: Record<string, string> = {};
  for (const row of rows) out[(await row.locator('th').textContent())!.trim()] = (await row.locator(`td:nth-of-type(${column})`).textContent())!.trim();
  return out;
}

describe('shares on one scale', () => {
  it('reads 0.30 as 30%, keeps that scale after saving and a reload, asks about a slip, and previews every cell target', async () => {
    const id = await newProject(`Ferry Sundays ${Date.now()}`);
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.waitForURL(`${baseUrl}/lead`);
    await page.goto(`${baseUrl}/lead/projects/${id}`);

    const file = ['variable,category,share', 'district,Harbour,0.30', 'district,Uplands,0.30', 'district,Old Town,0.40'].join('\n');
    await page.getByLabel('Targets file (CSV: variable,category,share)').setInputFiles({ name: 'districts.csv', mimeType: 'text/csv', buffer: Buffer.from(`${file}\n`) });
    await page.getByRole('button', { name: 'Read file' }).click();
    await page.getByText(/Read from districts\.csv: 1 variable\./).waitFor();
    expect(await page.getByLabel('district: share of Harbour').inputValue()).toBe('30');
    expect(await page.getByLabel('district: share of Old Town').inputValue()).toBe('40');

    await page.getByRole('button', { name: 'Save targets' }).click();
    const preview = page.getByRole('dialog', { name: 'Check the cell targets' });
    await preview.waitFor();
    // 200 × 30% = 60, 200 × 40% = 80 (common practice: targets are the sample size times the share).
    expect(await targetsIn(preview.getByRole('table', { name: 'New cell targets' }), 1)).toEqual({
      'district: Harbour': '60', 'district: Uplands': '60', 'district: Old Town': '80',
    });
    await screenshot(page, 'phone-lead-cell-preview');
    await preview.getByRole('button', { name: 'Save these targets' }).click();
    await page.getByText('Targets saved; the cell targets below are recomputed.').waitFor();

    await page.reload();
    await page.getByLabel('district: share of Harbour').waitFor();
    expect(await page.getByLabel('district: share of Harbour').inputValue()).toBe('30');

    // The scale used in the file, typed among percentages: asked, not saved.
    await page.getByLabel('district: share of Harbour').fill('0.35');
    await page.getByRole('button', { name: 'Save targets' }).click();
    const question = page.getByRole('dialog', { name: 'Shares do not add up to 100%' });
    await question.getByText('district: 70.35').waitFor();
    await question.getByRole('button', { name: 'Go back' }).click();

    await page.getByLabel('district: share of Harbour').fill('35');
    await page.getByLabel('district: share of Uplands').fill('25');
    await page.getByRole('button', { name: 'Save targets' }).click();
    await preview.waitFor();
    const table = preview.getByRole('table', { name: 'New cell targets' });
    expect(await targetsIn(table, 1)).toEqual({ 'district: Harbour': '60', 'district: Uplands': '60', 'district: Old Town': '80' });
    expect(await targetsIn(table, 2)).toEqual({ 'district: Harbour': '70', 'district: Uplands': '50', 'district: Old Town': '80' });
    await preview.getByText('3 cells sharing a sample of 200; 2 targets change.').waitFor();
    await preview.getByRole('button', { name: 'Save these targets' }).click();
    await page.getByText('Targets saved; the cell targets below are recomputed.').waitFor();
    expect(await targetsIn(page.getByRole('table', { name: 'Cell targets', exact: true }), 2)).toEqual({
      'district: Harbour': '70', 'district: Uplands': '50', 'district: Old Town': '80',
    });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
  });
});

describe('stage changes', () => {
  it('ask first, say what happens, show why the server refuses, and Cancel changes nothing', async () => {
    const id = await newProject(`Ferry stages ${Date.now()}`);
    const { token } = await tokenFor(baseUrl, 'lead@vellmoor.example');
    await api(baseUrl, token, `/projects/${id}/targets`, 'PUT', {
      variables: [{ name: 'district', categories: [{ label: 'Harbour', share: 50 }, { label: 'Uplands', share: 50 }] }],
    });
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.waitForURL(`${baseUrl}/lead`);
    await page.goto(`${baseUrl}/lead/projects/${id}`);

    await page.getByRole('button', { name: 'Start fieldwork' }).click();
    const start = page.getByRole('dialog', { name: 'Start fieldwork?' });
    await start.getByText(/Interviewers on the team get the cells at their next sync/).waitFor();
    await start.getByRole('button', { name: 'Cancel' }).click();
    expect((await api<{ status: string }>(baseUrl, token, `/projects/${id}`)).status).toBe('setup');

    // No interviewer on the team yet: the server says so inside the question, and nothing moves.
    await page.getByRole('button', { name: 'Start fieldwork' }).click();
    await start.getByRole('button', { name: 'Start fieldwork' }).click();
    await start.getByText('Fieldwork cannot start yet: add at least one interviewer to the team.').waitFor();
    await screenshot(page, 'phone-lead-start-refused');
    await start.getByRole('button', { name: 'Cancel' }).click();
    expect((await api<{ status: string }>(baseUrl, token, `/projects/${id}`)).status).toBe('setup');

    const people = await api<{ id: string; role: string }[]>(baseUrl, token, '/users');
    await api(baseUrl, token, `/projects/${id}/members`, 'PUT', { userIds: people.filter((p) => p.role === 'interviewer').map((p) => p.id).slice(0, 1) });
    await page.reload();
    await page.getByRole('button', { name: 'Start fieldwork' }).click();
    await start.getByRole('button', { name: 'Start fieldwork' }).click();
    await page.getByText('In the field', { exact: true }).waitFor();

    await page.getByRole('button', { name: 'Back to set-up' }).click();
    const back = page.getByRole('dialog', { name: 'Move the project back to set-up?' });
    await back.getByText(/Every interview logged so far is kept and still counts/).waitFor();
    await back.getByRole('button', { name: 'Cancel' }).click();
    expect((await api<{ status: string }>(baseUrl, token, `/projects/${id}`)).status).toBe('fieldwork');
    // Back to set-up once confirmed (which also keeps this project from becoming the board's default).
    await page.getByRole('button', { name: 'Back to set-up' }).click();
    await back.getByRole('button', { name: 'Back to set-up' }).click();
    await page.getByText('Being set up', { exact: true }).waitFor();
    expect((await api<{ status: string }>(baseUrl, token, `/projects/${id}`)).status).toBe('setup');
    // Leave the demo's interviewers with only their own projects, for the tests after this one.
    await api(baseUrl, token, `/projects/${id}/members`, 'PUT', { userIds: [] });
  });
});
