// A lead's balance for a small pilot: too few interviews in a category for the share's
// interval and the bias factor's interval to be trusted, so the page withholds them and
// says why (docs/methods.md, section 4). The project and its interviews are invented here.
import { randomUUID } from 'node:crypto';
import { afterEach, describe, expect, inject, it } from 'vitest';
import { DESKTOP, openBrowser, screenshot, signIn, type Browser } from './browser.js';
import { api, tokenFor } from './fieldwork-steps.js';

const baseUrl = inject('baseUrl');
let browser: Browser | undefined;
afterEach(async () => {
  await browser?.close();
  browser = undefined;
});

describe('withheld figures on the balance page', () => {
  it('shows "Withheld" and the reason where the intervals would be', async () => {
    const lead = await tokenFor(baseUrl, 'lead@vellmoor.example');
    const interviewer = await tokenFor(baseUrl, 'interviewer@vellmoor.example');
    const project = await api<{ id: string }>(baseUrl, lead.token, '/projects', 'POST', {
      name: 'Vellmoor library hours pilot', fieldStart: '2026-11-16', fieldEnd: '2026-12-06', targetSize: 40,
      headlineQuestion: 'Should the libraries open on Sundays?',
    });
    const targets = await api<{ variables: { id: string; name: string; categories: { id: string; label: string }[] }[] }>(baseUrl, lead.token, `/projects/${project.id}/targets`, 'PUT', { variables: [
        { name: 'sex', categories: [{ label: 'female', share: 0.5 }, { label: 'male', share: 0.5 }] },
        { name: 'area', categories: [{ label: 'town', share: 0.6 }, { label: 'country', share: 0.4 }] },
      ] },
    );
    await api(baseUrl, lead.token, `/projects/${project.id}/members`, 'PUT', { userIds: [interviewer.userId] });
    const id = (variable: string, label: string) => {
      const v = targets.variables.find((x) => x.name === variable)!;
      return [v.id, v.categories.find((c) => c.label === label)!.id] as const;
    };
    const respondent = (sex: string, area: string, yes: boolean) => ({
      id: randomUUID(), disposition: 'complete', headlineAnswer: yes,
      categories: Object.fromEntries([id('sex', sex), id('area', area)]),
      startedAt: '2026-11-20T10:00:00Z', endedAt: '2026-11-20T10:12:00Z',
    });
    const interviews = [
      ...Array.from({ length: 9 }, (_, i) => respondent(i % 2 ? 'female' : 'male', 'town', i % 3 === 0)),
      ...Array.from({ length: 3 }, (_, i) => respondent('female', 'country', i === 0)),
    ];
    try {
      await api(baseUrl, interviewer.token, `/projects/${project.id}/interviews/sync`, 'POST', { interviews });
    } finally {
      // The demo interviewer's phone screens in other tests show the tram project only.
      await api(baseUrl, lead.token, `/projects/${project.id}/members`, 'PUT', { userIds: [] });
    }

    browser = await openBrowser(DESKTOP);
    const { page } = browser;
    await signIn(page, baseUrl, 'lead@vellmoor.example');
    await page.waitForURL(`${baseUrl}/lead`);
    await page.getByRole('link', { name: 'Balance', exact: true }).click();
    await page.getByRole('combobox', { name: 'Project', exact: true }).selectOption({ label: 'Vellmoor library hours pilot' });
    await page.getByText('12 of 40 completes counted').waitFor();
    const note = page.getByRole('note');
    await note.waitFor();
    expect(await note.textContent()).toContain('area: country has 3 interviews, fewer than 5');
    expect(await note.textContent()).toMatch(/effective sample size is [\d.]+, under 30/);
    const figures = page.getByRole('definition');
    expect(await figures.filter({ hasText: 'Withheld' }).count()).toBe(2);
    await note.scrollIntoViewIfNeeded();
    await screenshot(page, 'desktop-lead-balance-withheld');
  });
});
