// A new agency can start: self-service sign-up (off by default, on by SIGNUP_ENABLED) and
// `plumbline org create` both make an organisation whose first admin confirms the e-mail
// address by following the invitation from the local mail fake and choosing a password.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { runAsync } from '../src/cli/run.js';
import { linkIn, mailsTo, tokenOf, waitForMails } from '../../test/mail-fake.js';
import { createOrg, signIn, startApp, type Harness } from './harness.js';

const mailApi = inject('mailFake').apiUrl;
const unique = (name: string) => `${name}.${Math.random().toString(36).slice(2, 8)}@neworg.example`;
let h: Harness;

async function acceptInvitation(email: string, password: string) {
  const [mail] = await waitForMails(mailApi, email);
  const res = await h.http().post('/api/account/password').send({ token: tokenOf(linkIn(mail!)), password });
  expect(res.status).toBe(200);
  return signIn(h, email, password);
}

describe('sign-up, off by default', () => {
  beforeAll(async () => {
    h = await startApp();
  });
  afterAll(() => h.close());

  it('says it is off and refuses a sign-up, creating nothing', async () => {
    expect((await h.http().get('/api/sign-up')).body).toEqual({ enabled: false });
    const before = await h.db('organisations').count({ n: '*' });
    const res = await h.http().post('/api/sign-up').send({ organisation: 'Closed Door', name: 'Nia', email: unique('nia') });
    expect(res.status).toBe(404);
    expect(await h.db('organisations').count({ n: '*' })).toEqual(before);
  });
});

describe('sign-up, switched on', () => {
  beforeAll(async () => {
    h = await startApp({ SIGNUP_ENABLED: 'true' });
  });
  afterAll(() => h.close());

  it('creates the organisation; its admin confirms the address through the e-mailed link and signs in', async () => {
    expect((await h.http().get('/api/sign-up')).body).toEqual({ enabled: true });
    const email = unique('rhea');
    const res = await h.http().post('/api/sign-up').send({ organisation: 'Harrowby Field Services', name: 'Rhea Castell', email });
    expect(res.status).toBe(202);
    expect(res.body.message).toMatch(/Check your e-mail/);
    const session = await acceptInvitation(email, 'harrowby field starts today');
    expect(session.user.role).toBe('admin');
    const me = await h.http().get('/api/auth/me').set('Authorization', `Bearer ${session.accessToken}`);
    expect(me.body.organisation.name).toBe('Harrowby Field Services');
    const people = await h.http().get('/api/users').set('Authorization', `Bearer ${session.accessToken}`);
    expect(people.body.map((p: { email: string }) => p.email)).toEqual([email]);
  });

  it('answers an address that already has an account the same way, and tells its owner by mail only', async () => {
    const existing = await createOrg(h.db, 'Signupdup');
    const before = await h.db('organisations').count({ n: '*' });
    const res = await h.http().post('/api/sign-up').send({ organisation: 'Second Try', name: 'Dup', email: existing.users.lead.email });
    expect(res.status).toBe(202);
    expect(res.body.message).toMatch(/Check your e-mail/);
    const [mail] = await waitForMails(mailApi, existing.users.lead.email);
    expect(mail!.subject).toBe('You already have a Plumbline account');
    expect(await h.db('organisations').count({ n: '*' })).toEqual(before);
  });

  it('refuses a blank organisation name with a clear 400', async () => {
    const res = await h.http().post('/api/sign-up').send({ organisation: '   ', name: 'X', email: unique('x') });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/organisation must not be empty/);
  });
});

describe('plumbline org create', () => {
  beforeAll(async () => {
    h = await startApp();
  });
  afterAll(() => h.close());

  async function plumbline(...args: string[]) {
    let stdout = '';
    let stderr = '';
    const code = await runAsync(args, { out: (t) => (stdout += t), err: (t) => (stderr += t) });
    return { code, stdout, stderr };
  }

  it('creates the organisation and queues its admin invitation, which the running server sends', async () => {
    const email = unique('ops');
    const result = await plumbline('org', 'create', '--name', 'Mardon Polling', '--admin-email', email, '--admin-name', 'Otto Pell');
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    const out = JSON.parse(result.stdout);
    expect(out).toMatchObject({ organisation: { name: 'Mardon Polling' }, admin: { email, name: 'Otto Pell' } });
    const session = await acceptInvitation(email, 'mardon polling opens its doors');
    expect(session.user.role).toBe('admin');
    expect((await h.db('users').where({ id: session.user.id }).first())!.organisation_id).toBe(out.organisation.id);
  });

  it.each([
    [['org', 'create', '--admin-email', 'a@b.example'], '--name is missing or empty'],
    [['org', 'create', '--name', 'X', '--admin-email', 'nope'], '--admin-email must be an e-mail address, got "nope"'],
    [['org', 'delete', '--name', 'X'], 'unknown action "delete"'],
  ])('refuses bad input with exit 2 and one line (%j)', async (args, message) => {
    const before = await h.db('organisations').count({ n: '*' });
    const result = await plumbline(...args);
    expect(result.code).toBe(2);
    expect(result.stdout).toBe('');
    expect(result.stderr).toContain(message);
    expect(await h.db('organisations').count({ n: '*' })).toEqual(before);
  });

  it('refuses an admin e-mail that already has an account, creating nothing and sending nothing', async () => {
    const existing = await createOrg(h.db, 'Clidup');
    const before = await h.db('organisations').count({ n: '*' });
    const result = await plumbline('org', 'create', '--name', 'Dup Agency', '--admin-email', existing.users.admin.email.toUpperCase());
    expect(result.code).toBe(2);
    expect(result.stderr).toMatch(/already has an account; nothing was created/);
    expect(await h.db('organisations').count({ n: '*' })).toEqual(before);
    await new Promise((r) => setTimeout(r, 1500));
    expect(await mailsTo(mailApi, existing.users.admin.email)).toEqual([]);
  });
});
