import { afterEach, describe, expect, inject, it } from 'vitest';
import { DESKTOP, openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

// Each role lands on its own home (seeded demo accounts of the invented Vellmoor agency).
const HOMES = [
  { role: 'interviewer', path: '/interviewer', title: 'Today' },
  { role: 'supervisor', path: '/supervisor', title: 'Quota board' },
  { role: 'lead', path: '/lead', title: 'Projects' },
  { role: 'client', path: '/client', title: 'Progress' },
  { role: 'admin', path: '/admin', title: 'People' },
] as const;

describe('sign-in at phone size', () => {
  for (const home of HOMES) {
    it(`takes the ${home.role} to the ${home.title} page`, async () => {
      browser = await openBrowser(PHONE);
      const { page } = browser;
      await signIn(page, baseUrl, `${home.role}@vellmoor.example`);
      await page.waitForURL(`${baseUrl}${home.path}`);
      const heading = page.getByRole('heading', { level: 1, name: home.title });
      await heading.waitFor();
      expect(await heading.isVisible()).toBe(true);
      await screenshot(page, `phone-${home.role}-home`);
    });
  }

  it('shows the lead the seeded Vellmoor project and keeps the sign-in across a reload', async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.getByText('Vellmoor tram extension').first().waitFor();
    await page.reload();
    await page.getByText('Vellmoor tram extension').first().waitFor();
    expect(new URL(page.url()).pathname).toBe('/lead');
  });

  it('refuses a wrong password with the server’s message', async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await page.goto(`${baseUrl}/sign-in`);
    await screenshot(page, 'phone-sign-in');
    await page.getByLabel('E-mail').fill('lead@vellmoor.example');
    await page.getByLabel('Password').fill('wrong password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is not correct').waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
  });

  it('sends a role to its own home when it opens another role’s page', async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await signIn(page, baseUrl, 'client@vellmoor.example');
    await page.waitForURL(`${baseUrl}/client`);
    await page.goto(`${baseUrl}/admin`);
    await page.waitForURL(`${baseUrl}/client`);
  });
});

describe('desktop', () => {
  it('shows the lead’s landing page at desktop size', async () => {
    browser = await openBrowser(DESKTOP);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.waitForURL(`${baseUrl}/lead`);
    await page.getByText('Vellmoor tram extension').first().waitFor();
    await screenshot(page, 'desktop-lead-home');
  });
});
