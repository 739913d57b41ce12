// The admin invites a person at phone size; the person opens the link from the e-mail
// (read from the local mail fake's API), chooses a password and lands signed in on their home.
import { afterEach, describe, expect, inject, it } from 'vitest';
import { linkIn, waitForMails } from '../mail-fake.js';
import { openBrowser, PHONE, screenshot, signIn, type Browser } from './browser.js';

const baseUrl = inject('baseUrl');
const mailApi = inject('mailApiUrl');
const browsers: Browser[] = [];
afterEach(async () => {
  await Promise.all(browsers.splice(0).map((b) => b.close()));
});

describe('inviting a person', () => {
  it('admin invites; the person sets a password through the e-mailed link and is signed in', async () => {
    const tag = Date.now().toString(36);
    const email = `new.interviewer.${tag}@vellmoor.example`;
    const name = `Nell Ashdown ${tag}`;
    const admin = await openBrowser(PHONE);
    browsers.push(admin);
    await signIn(admin.page, baseUrl, 'admin@vellmoor.example');
    await admin.page.getByRole('button', { name: 'Invite a person' }).click();
    const dialog = admin.page.getByRole('dialog', { name: 'Invite a person' });
    await dialog.getByLabel('Name').fill(name);
    await dialog.getByLabel('E-mail').fill(email);
    await dialog.getByLabel('Role').selectOption({ label: 'Interviewer' });
    await screenshot(admin.page, 'phone-admin-invite');
    await dialog.getByRole('button', { name: 'Send invitation' }).click();
    await admin.page.getByText(`Invitation sent to ${email}`).waitFor();
    const card = admin.page.getByRole('listitem').filter({ hasText: name });
    await card.getByText(/Invited/).waitFor();

    const [mail] = await waitForMails(mailApi, email);
    const link = linkIn(mail!);
    expect(new URL(link).origin).toBe(baseUrl);

    const invitee = await openBrowser(PHONE);
    browsers.push(invitee);
    const { page } = invitee;
    await page.goto(link);
    await page.getByRole('heading', { level: 1, name: 'Choose your password' }).waitFor();
    await page.getByText(`Welcome, ${name}`, { exact: false }).waitFor();
    expect(new URL(page.url()).hash).toBe('');
    await page.getByLabel('New password').fill('qwerty123456');
    await page.getByRole('button', { name: 'Save password and sign in' }).click();
    await page.getByText(/too common/).waitFor();
    await page.getByLabel('New password').fill('lanterns along the Mardon road');
    await screenshot(page, 'phone-set-password');
    await page.getByRole('button', { name: 'Save password and sign in' }).click();
    await page.waitForURL(`${baseUrl}/interviewer`);
    await page.getByRole('heading', { level: 1, name: 'Today' }).waitFor();

    // The admin's list shows the account as active once re-read.
    await admin.page.reload();
    const row = admin.page.getByRole('listitem').filter({ hasText: name });
    await row.getByText('Interviewer', { exact: true }).waitFor();
    expect(await row.getByText(/Invited/).count()).toBe(0);
  });
});
