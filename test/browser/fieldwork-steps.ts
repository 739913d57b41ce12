// Steps of the interviewer's job and reads of the API that several browser tests share.
import type { Page } from 'playwright-core';
import { DEMO_PASSWORD, screenshot } from './browser.js';

export async function tokenFor(baseUrl: string, email: string): Promise<{ token: string; userId: string }> {
  const response = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  const body = (await response.json()) as { accessToken: string; user: { id: string } };
  return { token: body.accessToken, userId: body.user.id };
}

export async function api<T>(baseUrl: string, token: string, path: string, method = 'GET', body?: unknown): Promise<T> {
  const response = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { Authorization: `Bearer ${token}`, ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${await response.text()}`);
  return (await response.json()) as T;
}

export interface Board {
  cells: { id: string; label: string; overQuota: number; status: string }[];
  interviewers: { id: string; completesTotal: number }[];
}

export async function vellmoorId(baseUrl: string, token: string): Promise<string> {
  const projects = await api<{ id: string; name: string }[]>(baseUrl, token, '/projects');
  return projects.find((p) => p.name === 'Vellmoor tram extension')!.id;
}

/**
 * Waits until the service worker controls the page and holds every script and style the
 * page has loaded, so a reload works without network.
 */
export async function waitForServiceWorker(page: Page): Promise<void> {
  await page.waitForFunction(async () => {
    const registration = await navigator.serviceWorker.ready;
    if (!registration.active || !navigator.serviceWorker.controller) return false;
    const files = performance
      .getEntriesByType('resource')
      .map((entry) => new URL(entry.name))
      .filter((url) => url.origin === location.origin && url.pathname.startsWith('/assets/'));
    const held = await Promise.all(files.map(async (url) => (await caches.match(url.href)) !== undefined));
    return held.every(Boolean);
  });
}

/** Logs one complete through the screen: outcome, categories, cell check, headline answer. */
export async function logComplete(page: Page, categories: Record<string, string>, answer: 'Yes' | 'No', shotPrefix?: string) {
  await page.getByRole('button', { name: 'Log a contact for Vellmoor tram extension' }).click();
  if (shotPrefix) await screenshot(page, `${shotPrefix}-outcome`);
  await page.getByRole('radio', { name: 'Complete', exact: true }).click();
  for (const [variable, category] of Object.entries(categories)) {
    await page.getByRole('radiogroup', { name: variable }).getByRole('radio', { name: category, exact: true }).click();
  }
  if (shotPrefix) await screenshot(page, `${shotPrefix}-categories`);
  await page.getByRole('button', { name: 'Check their cells' }).click();
  await page.getByRole('heading', { name: 'Their cells' }).waitFor();
  if (shotPrefix) await screenshot(page, `${shotPrefix}-cells`);
  await page.getByRole('button', { name: 'Start the interview' }).click();
}

export async function answerAndSave(page: Page, answer: 'Yes' | 'No', shotPrefix?: string) {
  await page.getByRole('radio', { name: answer, exact: true }).click();
  if (shotPrefix) await screenshot(page, `${shotPrefix}-answer`);
  await page.getByRole('button', { name: 'Save interview' }).click();
  await page.getByText('Complete saved on this device.').waitFor();
}

// Respondents whose cells the seeded demo leaves open (the demo's sample is short of young
// men, basic education and the outlying regions), so no full-cell question interrupts.
export const RESPONDENTS: { categories: Record<string, string>; answer: 'Yes' | 'No' }[] = [
  { categories: { 'Age band': '18-24', Sex: 'male', Region: 'Mardon', Education: 'basic' }, answer: 'Yes' },
  { categories: { 'Age band': '25-34', Sex: 'female', Region: 'Old Quay', Education: 'secondary' }, answer: 'No' },
  { categories: { 'Age band': '35-44', Sex: 'male', Region: 'Tarnholm', Education: 'vocational' }, answer: 'Yes' },
  { categories: { 'Age band': '25-34', Sex: 'male', Region: 'Kestle Vale', Education: 'basic' }, answer: 'No' },
  { categories: { 'Age band': '45-54', Sex: 'male', Region: 'Mardon', Education: 'secondary' }, answer: 'Yes' },
];

