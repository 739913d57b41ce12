// A category renamed on the lead's set-up screen while an interviewer's phone is offline:
// the phone still offers the old name (and sends the old category id); once it is back
// online its interview is accepted and counted under the new name, on the cells and the
// balance alike.
import { afterEach, describe, expect, inject, it } from 'vitest';
import { DESKTOP, openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';
import { answerAndSave, api, logComplete, RESPONDENTS, tokenFor, vellmoorId, waitForServiceWorker } from './fieldwork-steps.js';

const baseUrl = inject('baseUrl');
const opened: Browser[] = [];
afterEach(async () => {
  for (const browser of opened.splice(0)) await browser.close();
});

interface SavedTargets {
  variables: { id: string; name: string; columnName: string; interlocked: boolean; categories: { id: string; label: string; share: number }[] }[];
  jointShares: { categories: string[]; share: number }[];
}
type Cells = { cells: { label: string; achieved: number }[] };
type Balance = { n: number; margins: { variable: string; category: string; unweighted: number }[] };

/** Puts the saved targets back with one category's label changed, every id carried. */
async function relabel(token: string, projectId: string, from: string, to: string): Promise<void> {
  const saved = await api<SavedTargets>(baseUrl, token, `/projects/${projectId}/targets`);
  const variables = saved.variables.map(({ id, name, columnName, interlocked, categories }) => ({
    id, name, columnName, interlocked,
    categories: categories.map((c) => ({ id: c.id, label: c.label === from ? to : c.label, share: c.share })),
  }));
  await api(baseUrl, token, `/projects/${projectId}/targets`, 'PUT', { variables, jointShares: saved.jointShares });
}

describe('a category renamed mid-field', () => {
  it('counts the offline interview logged under the old name under the new one', async () => {
    const lead = await tokenFor(baseUrl, 'lead@vellmoor.example');
    const projectId = await vellmoorId(baseUrl, lead.token);
    const achieved = async (label: string) =>
      (await api<Cells>(baseUrl, lead.token, `/projects/${projectId}/cells`)).cells.find((c) => c.label === label)?.achieved;
    const before = await achieved('Region: Tarnholm');
    expect(before).toBeGreaterThan(0);
    const respondent = RESPONDENTS.find((r) => r.categories.Region === 'Tarnholm')!;

    try {
      const phone = await openBrowser(PHONE);
      opened.push(phone);
      await signIn(phone.page, baseUrl, 'interviewer@vellmoor.example');
      await phone.page.getByText('Cells as of the sync').waitFor();
      await waitForServiceWorker(phone.page);
      await phone.context.setOffline(true);
      await phone.page.getByText('Offline', { exact: true }).waitFor();
      await logComplete(phone.page, respondent.categories, respondent.answer);
      await answerAndSave(phone.page, respondent.answer);
      await phone.page.getByText('1 unsent interview in the outbox').waitFor();

      // Meanwhile the lead renames Tarnholm on the set-up screen.
      const office = await openBrowser(DESKTOP);
      opened.push(office);
      await signIn(office.page, baseUrl, 'lead@vellmoor.example');
      await office.page.waitForURL(`${baseUrl}/lead`);
      await office.page.goto(`${baseUrl}/lead/projects/${projectId}`);
      const region = (await api<SavedTargets>(baseUrl, lead.token, `/projects/${projectId}/targets`)).variables.find((v) => v.name === 'Region')!;
      const position = region.categories.findIndex((c) => c.label === 'Tarnholm') + 1;
      const label = office.page.getByLabel(`Region: category ${position}`, { exact: true });
      expect(await label.inputValue()).toBe('Tarnholm');
      await label.fill('Tarnholm Vale');
      await office.page.getByRole('button', { name: 'Save targets' }).click();
      // Every cell target is shown first; the renamed cells keep their targets.
      await office.page.getByRole('dialog', { name: 'Check the cell targets' }).getByRole('button', { name: 'Save these targets' }).click();
      await office.page.getByText('Targets saved').waitFor();
      await screenshot(office.page, 'rename-1-lead-renamed');
      expect(await achieved('Region: Tarnholm Vale')).toBe(before);

      // The phone comes back with the old category id: accepted, counted under the new name.
      await phone.context.setOffline(false);
      await phone.page.getByRole('link', { name: 'Outbox', exact: true }).click();
      await phone.page.getByText('Nothing is waiting to be sent.').waitFor();
      expect(await phone.page.getByText(/refused|could not be stored/i).count()).toBe(0);
      await screenshot(phone.page, 'rename-2-phone-sent');
      expect(await achieved('Region: Tarnholm Vale')).toBe(before! + 1);
      expect(await achieved('Region: Tarnholm')).toBeUndefined();
      const balance = await api<Balance>(baseUrl, lead.token, `/projects/${projectId}/balance`);
      expect(balance.margins.some((m) => m.variable === 'Region' && m.category === 'Tarnholm Vale' && m.unweighted > 0)).toBe(true);
    } finally {
      await relabel(lead.token, projectId, 'Tarnholm Vale', 'Tarnholm');
    }
  });
});
