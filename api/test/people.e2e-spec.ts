// The admin's people management, end to end: the invitation is read from the local mail
// fake (maildev's API) and its link followed; roles change at once; a disabled account is
// refused everywhere at once and can be enabled again.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { linkIn, tokenOf, waitForMails } from '../../test/mail-fake.js';
import { createOrg, PASSWORD, signIn, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;
let admin: string;
const mailApi = inject('mailFake').apiUrl;
const NEW_PASSWORD = 'tram lines over Harrowby hill';

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Peopletest');
  admin = (await signIn(h, org.users.admin.email)).accessToken;
});
afterAll(() => h.close());

const asAdmin = () => ({
  post: (path: string, body: object = {}) => h.http().post(path).set('Authorization', `Bearer ${admin}`).send(body),
  patch: (path: string, body: object) => h.http().patch(path).set('Authorization', `Bearer ${admin}`).send(body),
});
const unique = (name: string) => `${name}.${Math.random().toString(36).slice(2, 8)}@peopletest.example`;

describe('inviting a person', () => {
  it('creates an invited account, mails a link that sets the password, and the person signs in', async () => {
    const email = unique('ines');
    const res = await asAdmin().post('/api/users/invitations', { email, name: 'Ines Harlow', role: 'supervisor' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email, name: 'Ines Harlow', role: 'supervisor', status: 'invited', active: true });
    // No password yet: signing in is refused like any wrong password.
    expect((await h.http().post('/api/auth/login').send({ email, password: NEW_PASSWORD })).status).toBe(401);

    const [mail] = await waitForMails(mailApi, email);
    expect(mail!.subject).toBe(`You are invited to ${(await h.db('organisations').where({ id: org.id }).first())!.name} on Plumbline`);
    expect(mail!.text).toContain('72 hours');
    const link = linkIn(mail!);
    expect(link.startsWith(`${h.config.accounts.appUrl}/set-password#token=`)).toBe(true);

    const token = tokenOf(link);
    const details = await h.http().post('/api/account/link').send({ token });
    expect(details.status).toBe(200);
    expect(details.body).toMatchObject({ purpose: 'invitation', email, name: 'Ines Harlow' });

    const set = await h.http().post('/api/account/password').send({ token, password: NEW_PASSWORD });
    expect(set.status).toBe(200);
    expect(set.body).toEqual({ email });
    const session = await signIn(h, email, NEW_PASSWORD);
    expect(session.user.role).toBe('supervisor');
    const list = await h.http().get('/api/users').set('Authorization', `Bearer ${admin}`);
    expect(list.body.find((u: { email: string }) => u.email === email).status).toBe('active');
  });

  it('stores only a hash of the token', async () => {
    const email = unique('hash');
    await asAdmin().post('/api/users/invitations', { email, name: 'Hash Check', role: 'client' });
    const token = tokenOf(linkIn((await waitForMails(mailApi, email))[0]!));
    const rows = await h.db('one_time_tokens').select('*');
    expect(JSON.stringify(rows)).not.toContain(token.split('.')[1]);
  });

  it('refuses an e-mail that already has an account (any letter case), creating nothing', async () => {
    const before = await h.db('users').count({ n: '*' });
    const res = await asAdmin().post('/api/users/invitations', { email: org.users.lead.email.toUpperCase(), name: 'Dup', role: 'lead' });
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('That e-mail address already has an account');
    expect(await h.db('users').count({ n: '*' })).toEqual(before);
  });

  it('is for admins only', async () => {
    const lead = (await signIn(h, org.users.lead.email)).accessToken;
    const res = await h.http().post('/api/users/invitations').set('Authorization', `Bearer ${lead}`).send({ email: unique('x'), name: 'X', role: 'client' });
    expect(res.status).toBe(403);
  });
});

describe('changing a role', () => {
  it('takes effect on the next request of the person, with the same token', async () => {
    const token = (await signIn(h, org.users.client.email)).accessToken;
    expect((await h.http().get('/api/users').set('Authorization', `Bearer ${token}`)).status).toBe(403);
    const res = await asAdmin().patch(`/api/users/${org.users.client.id}/role`, { role: 'lead' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('lead');
    expect((await h.http().get('/api/users').set('Authorization', `Bearer ${token}`)).status).toBe(200);
    await asAdmin().patch(`/api/users/${org.users.client.id}/role`, { role: 'client' });
  });

  it("refuses an unknown role, the admin's own role and another organisation's person", async () => {
    const bad = await asAdmin().patch(`/api/users/${org.users.lead.id}/role`, { role: 'owner' });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/role must be one of admin, lead, supervisor, interviewer, client/);
    const own = await asAdmin().patch(`/api/users/${org.users.admin.id}/role`, { role: 'lead' });
    expect(own.status).toBe(409);
    const other = await createOrg(h.db, 'Otherpeople');
    expect((await asAdmin().patch(`/api/users/${other.users.lead.id}/role`, { role: 'client' })).status).toBe(404);
    expect((await h.db('users').where({ id: other.users.lead.id }).first())!.role).toBe('lead');
  });
});

describe('disabling an account', () => {
  it('ends its sessions at once: access token, refresh token and sign-in are refused; enabling lets it in again', async () => {
    const person = org.users.interviewer;
    const session = await signIn(h, person.email);
    const disabled = await asAdmin().post(`/api/users/${person.id}/disable`);
    expect(disabled.status).toBe(200);
    expect(disabled.body).toMatchObject({ active: false, status: 'disabled' });

    expect((await h.http().get('/api/auth/me').set('Authorization', `Bearer ${session.accessToken}`)).status).toBe(401);
    expect((await h.http().post('/api/auth/refresh').send({ refreshToken: session.refreshToken })).status).toBe(401);
    expect((await h.http().post('/api/auth/login').send({ email: person.email, password: PASSWORD })).status).toBe(401);
    const open = await h.db('sessions').where({ user_id: person.id }).whereNull('revoked_at');
    expect(open).toEqual([]);

    const enabled = await asAdmin().post(`/api/users/${person.id}/enable`);
    expect(enabled.body).toMatchObject({ active: true, status: 'active' });
    // The old sign-in stays ended; a new one works.
    expect((await h.http().post('/api/auth/refresh').send({ refreshToken: session.refreshToken })).status).toBe(401);
    expect((await signIn(h, person.email)).user.id).toBe(person.id);
  });

  it('spends the open links of a disabled account', async () => {
    const email = unique('gone');
    const invited = await asAdmin().post('/api/users/invitations', { email, name: 'Gone Soon', role: 'interviewer' });
    const token = tokenOf(linkIn((await waitForMails(mailApi, email))[0]!));
    await asAdmin().post(`/api/users/${invited.body.id}/disable`);
    const res = await h.http().post('/api/account/password').send({ token, password: NEW_PASSWORD });
    expect(res.status).toBe(410);
  });

  it("refuses to disable the admin's own account", async () => {
    const res = await asAdmin().post(`/api/users/${org.users.admin.id}/disable`);
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('You cannot disable your own account; ask another admin');
  });
});
