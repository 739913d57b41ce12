// "Where the next interviews help most" on the seeded demo (invented Vellmoor agency): the
// supervisor's board on a phone and the lead's board on a desktop show the plan the API gives.
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

interface Plan {
  planned: number;
  plan: { label: string; interviews: number }[];
  costly: { label: string }[];
  problem: string | null;
}

async function tram(): Promise<{ id: string; plan: Plan }> {
  const projects = await apiAs<{ id: string; name: string }[]>('lead@vellmoor.example', '/projects');
  const id = projects.find((p) => p.name === 'Vellmoor tram extension')!.id;
  return { id, plan: await apiAs<Plan>('supervisor@vellmoor.example', `/projects/${id}/next-interviews?count=50`) };
}

const words = (label: string) => (label.includes(' × ') ? label.split(' × ').map((part) => part.split(': ').at(-1)).join(' · ') : label);

describe('where the next interviews help most', () => {
  it('shows the supervisor the next 50 interviews by cell on a phone, within the screen width', async () => {
    const { plan } = await tram();
    expect(plan.problem).toBeNull();
    expect(plan.planned).toBe(50);
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'supervisor@vellmoor.example');
    await page.waitForURL(`${baseUrl}/supervisor`);
    const section = page.getByRole('region', { name: 'Where the next interviews help most' });
    const list = section.getByRole('list', { name: 'The next 50 interviews, by cell' });
    await list.waitFor();
    expect(await list.getByRole('listitem').allTextContents()).toEqual(plan.plan.map((p) => `${p.interviews}in ${words(p.label)}`));
    await section.getByText('Next 50:').scrollIntoViewIfNeeded();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);
    await screenshot(page, 'phone-supervisor-next-interviews');
  });

  it('shows the lead the same plan and the cells to hold back on the project’s board on a desktop', async () => {
    const { id, plan } = await tram();
    browser = await openBrowser(DESKTOP);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.waitForURL(/\/lead/);
    await page.goto(`${baseUrl}/lead/projects/${id}/quota-board`);
    const section = page.getByRole('region', { name: 'Where the next interviews help most' });
    await section.getByRole('list', { name: 'The next 50 interviews, by cell' }).waitFor();
    const first = plan.plan[0]!;
    await section.getByText(new RegExp(`^Next 50: ${first.interviews} in ${words(first.label).replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}`)).waitFor();
    // The seeded demo has cells past their target.
    expect(plan.costly.length).toBeGreaterThan(0);
    const costly = section.getByRole('list', { name: 'Hold back: more interviews here cost precision' });
    const shown = await costly.getByRole('listitem').allTextContents();
    expect(shown.map((text) => text.replace(/ [\d,]+ of [\d,]+, .*$/, ''))).toEqual(plan.costly.map((c) => words(c.label)));
    await section.scrollIntoViewIfNeeded();
    await screenshot(page, 'desktop-lead-next-interviews');
  });
});
