// Every page of every role at phone size (360×640), checked with axe-core (no serious or
// critical violation of its WCAG 2.x and best-practice rules) and for width (nothing wider
// than the phone; tables scroll inside their own box). One browser per role, signed in once;
// the problems of all pages are gathered and reported together. Dialogs are checked open.
import type { Page } from 'playwright-core';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { RESPONDENTS, tokenFor, vellmoorId } from './fieldwork-steps.js';
import { checkPage, settled, type PageProblem } from './page-checks.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

async function checkPages(page: Page, paths: string[]): Promise<PageProblem[]> {
  const problems: PageProblem[] = [];
  for (const path of paths) {
    await page.goto(`${baseUrl}${path}`);
    await settled(page);
    expect(new URL(page.url()).pathname, `${path} stays on its page`).toBe(path.split('?')[0]);
    problems.push(...(await checkPage(page, path)));
    await screenshot(page, `a11y${path.split('?')[0]!.replaceAll('/', '-').replace(/-[0-9a-f-]{36}/, '-project')}`);
  }
  return problems;
}

async function asRole(email: string, home: string): Promise<Page> {
  browser = await openBrowser(PHONE);
  await signIn(browser.page, baseUrl, email);
  await browser.page.waitForURL(`${baseUrl}${home}`);
  await settled(browser.page);
  return browser.page;
}

describe('accessibility and width at 360×640', () => {
  it('holds on the signed-out pages', async () => {
    browser = await openBrowser(PHONE);
    const problems = await checkPages(browser.page, ['/sign-in', '/forgot-password', '/sign-up', '/set-password?token=a.b']);
    expect(problems).toEqual([]);
  });

  it('notices an unlabelled field and an element wider than the phone (the check itself)', async () => {
    browser = await openBrowser(PHONE);
    const { page } = browser;
    await page.goto(`${baseUrl}/sign-in`);
    await settled(page);
    await page.evaluate(() => {
      const form = document.querySelector('form')!;
      form.insertAdjacentHTML('beforeend', '<input type="text"><div style="width: 480px">wide</div>');
    });
    const problems = (await checkPage(page, 'sign-in, spoilt')).map((found) => found.problem);
    expect(problems).toContainEqual(expect.stringMatching(/^critical label:/));
    expect(problems).toContainEqual(expect.stringMatching(/^runs past the right edge: .* to 500 px$/));
  });

  it('holds on the interviewer’s pages and every step of logging a contact', async () => {
    const page = await asRole('interviewer@vellmoor.example', '/interviewer');
    const problems = await checkPages(page, ['/interviewer/outbox', '/interviewer/cells', '/interviewer']);

    // Whatever the Tab key reaches shows the two-colour ring (theme.css, focus-contrast.test.ts).
    for (let i = 0; i < 6; i++) {
      await page.keyboard.press('Tab');
      const ring = await page.evaluate(() => {
        const element = document.activeElement as HTMLElement;
        const style = getComputedStyle(element);
        return { what: element.outerHTML.slice(0, 60), outline: `${style.outlineStyle} ${style.outlineWidth} ${style.outlineColor}`, shadow: style.boxShadow };
      });
      expect(ring.outline, ring.what).toBe('solid 3px rgb(20, 58, 62)');
      expect(ring.shadow, ring.what).toContain('rgb(240, 194, 110)');
      await screenshot(page, `a11y-focus-${i}`);
    }

    await page.getByRole('button', { name: 'Log a contact for Vellmoor tram extension' }).click();
    await page.getByRole('heading', { name: 'What happened?' }).waitFor();
    problems.push(...(await checkPage(page, 'log a contact: outcome')));
    await page.getByRole('radio', { name: 'Complete', exact: true }).click();
    await page.getByRole('heading', { name: 'Who is the respondent?' }).waitFor();
    for (const [variable, category] of Object.entries(RESPONDENTS[0]!.categories)) {
      await page.getByRole('radiogroup', { name: variable }).getByRole('radio', { name: category, exact: true }).click();
    }
    problems.push(...(await checkPage(page, 'log a contact: categories')));
    await page.getByRole('button', { name: 'Check their cells' }).click();
    await page.getByRole('heading', { name: 'Their cells' }).waitFor();
    problems.push(...(await checkPage(page, 'log a contact: their cells')));
    await page.getByRole('button', { name: 'Start the interview' }).click();
    await page.getByRole('heading', { name: 'The headline question' }).waitFor();
    await page.getByRole('radio', { name: 'Yes' }).click();
    problems.push(...(await checkPage(page, 'log a contact: headline question')));
    await page.getByRole('button', { name: 'Cancel' }).click();
    expect(problems).toEqual([]);
  });

  it('holds on the supervisor’s pages and the close-cell dialog', async () => {
    const page = await asRole('supervisor@vellmoor.example', '/supervisor');
    const problems = await checkPages(page, ['/supervisor/review']);
    // The review queue with an interview opened and the reason dialog up.
    await page.getByText('Details, reasons and decisions').first().click();
    problems.push(...(await checkPage(page, 'review queue, an interview opened')));
    await page.getByRole('checkbox').first().check();
    await page.getByRole('group', { name: 'Decide on the selected interviews' }).getByRole('button', { name: 'Reject' }).click();
    const reason = page.getByRole('dialog', { name: 'Reject 1 interview?' });
    await reason.waitFor();
    problems.push(...(await checkPage(page, 'review decision dialog')));
    await reason.getByRole('button', { name: 'Cancel' }).click();
    problems.push(...(await checkPages(page, ['/supervisor/interviewers', '/supervisor'])));
    await page.getByRole('button', { name: /^Close cell / }).first().click();
    const dialog = page.getByRole('dialog', { name: 'Close this cell?' });
    await dialog.waitFor();
    problems.push(...(await checkPage(page, 'close-cell dialog')));
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    problems.push(...(await checkPages(page, ['/supervisor/backchecks'])));
    await page.getByRole('button', { name: 'Record the outcome' }).first().click();
    await page.getByRole('radio', { name: /Not confirmed/ }).click();
    problems.push(...(await checkPage(page, 'back-check outcome form')));
    await screenshot(page, 'a11y-backcheck-outcome-form');
    expect(problems).toEqual([]);
  });

  it('holds on the lead’s pages', async () => {
    const page = await asRole('lead@vellmoor.example', '/lead');
    const project = await vellmoorId(baseUrl, (await tokenFor(baseUrl, 'lead@vellmoor.example')).token);
    const problems = await checkPages(page, [
      '/lead',
      '/lead/projects/new',
      `/lead/projects/${project}/quota-board`,
      `/lead/projects/${project}/interviewers`,
      `/lead/projects/${project}/review`,
      `/lead/projects/${project}/projection`,
      '/lead/balance',
      '/lead/benchmarks',
      '/lead/delivery',
      `/lead/projects/${project}`,
    ]);
    await page.getByRole('button', { name: 'Duplicate for a new wave' }).click();
    const dialog = page.getByRole('dialog', { name: 'Duplicate this project?' });
    await dialog.waitFor();
    problems.push(...(await checkPage(page, 'duplicate-project dialog')));
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    // Saving targets shows every cell target first (nothing is saved until confirmed).
    await page.getByRole('button', { name: 'Save targets' }).click();
    const preview = page.getByRole('dialog', { name: 'Check the cell targets' });
    await preview.waitFor();
    problems.push(...(await checkPage(page, 'cell-targets preview dialog')));
    await preview.getByRole('button', { name: 'Go back' }).click();
    expect(problems).toEqual([]);
  });

  it('holds on the client’s and the admin’s pages', async () => {
    let page = await asRole('client@vellmoor.example', '/client');
    const problems = await checkPages(page, ['/client', '/client/projection', '/client/other-polls']);
    await browser!.close();
    page = await asRole('admin@vellmoor.example', '/admin');
    problems.push(...(await checkPages(page, ['/admin'])));
    expect(problems).toEqual([]);
  });
});
