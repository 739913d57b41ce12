// The projection to the field end in Chromium against the seeded demo: the lead's page from the
// project page on a phone and a desktop, and the client's read-only page on a phone.
import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { DEMO_PASSWORD, DESKTOP, openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

interface ProjectionBody {
  completes: number;
  pacePerDay: number;
  atEnd: { expected: number; lower: number; upper: number };
  cells: { atRisk: boolean }[];
}

async function apiAs<T>(email: string, path: string): Promise<T> {
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  return (await (await fetch(`${baseUrl}/api${path}`, { headers: { Authorization: `Bearer ${accessToken}` } })).json()) as T;
}

async function tramProjectId(): Promise<string> {
  const projects = await apiAs<{ id: string; name: string }[]>('lead@vellmoor.example', '/projects');
  return projects.find((p) => p.name === 'Vellmoor tram extension')!.id;
}

function figure(page: Page, term: string) {
  return page.locator('dl[aria-label="Projection figures"] > div', { has: page.locator('dt', { hasText: term }) }).locator('dd');
}

const count = (n: number) => new Intl.NumberFormat('en-GB').format(n);

async function expectFigures(page: Page, projection: ProjectionBody) {
  await figure(page, 'Completes now').waitFor();
  expect(await figure(page, 'Completes now').textContent()).toMatch(new RegExp(`^${count(projection.completes)} of`));
  expect(await figure(page, 'At the field end').textContent()).toBe(
    `${count(Math.round(projection.atEnd.expected))}${count(projection.atEnd.lower)} to ${count(projection.atEnd.upper)}`,
  );
  const atRisk = projection.cells.filter((c) => c.atRisk).length;
  expect(await page.locator('tr', { hasText: 'at risk' }).count()).toBe(atRisk);
  await page.getByText(/assumes the recent pace continues/).waitFor();
  // Ionic's page transition (Web Animations) has ended, so the screenshot shows only this page.
  await page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
}

describe('projection to the field end', () => {
  it("shows the lead the figures GET /projection reports, from the project page, on a phone", async () => {
    const id = await tramProjectId();
    const projection = await apiAs<ProjectionBody>('lead@vellmoor.example', `/projects/${id}/projection`);
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.waitForURL(`${baseUrl}/lead`);
    await page.goto(`${baseUrl}/lead/projects/${id}`);
    await page.getByRole('link', { name: 'Projection →' }).click();
    await page.waitForURL(`${baseUrl}/lead/projects/${id}/projection`);
    await expectFigures(page, projection);
    // Nothing wider than the phone outside a box that scrolls on its own.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    await screenshot(page, 'phone-lead-projection');
  });

  it('shows the same on a desktop', async () => {
    const id = await tramProjectId();
    const projection = await apiAs<ProjectionBody>('lead@vellmoor.example', `/projects/${id}/projection`);
    browser = await openBrowser(DESKTOP);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.waitForURL(`${baseUrl}/lead`);
    await page.goto(`${baseUrl}/lead/projects/${id}/projection`);
    await expectFigures(page, projection);
    await screenshot(page, 'desktop-lead-projection');
  });

  it('shows the client the same projection read-only on a phone', async () => {
    const id = await tramProjectId();
    const projection = await apiAs<ProjectionBody>('client@vellmoor.example', `/projects/${id}/projection`);
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'client@vellmoor.example');
    await page.waitForURL(`${baseUrl}/client`);
    await page.getByRole('link', { name: 'Projection' }).click();
    await expectFigures(page, projection);
    expect(await page.getByRole('button', { name: /save|close cell|export|download/i }).count()).toBe(0);
    await screenshot(page, 'phone-client-projection');
  });
});
