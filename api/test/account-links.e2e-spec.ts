// One-time links end to end: a reset asked for on the sign-in page or sent by the admin
// arrives in the local mail fake and its link sets a new password once; links expire and
// are single use; the same password rule holds on every path that sets a password.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { linkIn, mailsTo, tokenOf, waitForMails } from '../../test/mail-fake.js';
import { createOrg, PASSWORD, signIn, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;
let admin: string;
const mailApi = inject('mailFake').apiUrl;

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Linktest');
  admin = (await signIn(h, org.users.admin.email)).accessToken;
});
afterAll(() => h.close());

const unique = (name: string) => `${name}.${Math.random().toString(36).slice(2, 8)}@linktest.example`;
const setPassword = (token: string, password: string) => h.http().post('/api/account/password').send({ token, password });

async function invite(name: string): Promise<{ email: string; id: string; token: string }> {
  const email = unique(name.toLowerCase().replace(/\W+/g, '.'));
  const res = await h.http().post('/api/users/invitations').set('Authorization', `Bearer ${admin}`).send({ email, name, role: 'interviewer' });
  if (res.status !== 201) throw new Error(`invitation refused: ${JSON.stringify(res.body)}`);
  const token = tokenOf(linkIn((await waitForMails(mailApi, email))[0]!));
  return { email, id: res.body.id, token };
}

describe('password reset asked for from the sign-in page', () => {
  it('answers the same for a known and an unknown address, and mails only the known one', async () => {
    const known = await h.http().post('/api/account/password-reset').send({ email: org.users.supervisor.email });
    const unknown = await h.http().post('/api/account/password-reset').send({ email: 'nobody@linktest.example' });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);

    const [mail] = await waitForMails(mailApi, org.users.supervisor.email);
    expect(mail!.subject).toBe('Choose a new Plumbline password');
    await new Promise((r) => setTimeout(r, 1500));
    expect(await mailsTo(mailApi, 'nobody@linktest.example')).toEqual([]);

    // The old password works until the link is used; then only the new one, and old sign-ins end.
    const before = await signIn(h, org.users.supervisor.email);
    const token = tokenOf(linkIn(mail!));
    expect((await h.http().post('/api/account/link').send({ token })).body.purpose).toBe('password_reset');
    expect((await setPassword(token, 'supervisor keeps the board level')).status).toBe(200);
    expect((await h.http().post('/api/auth/login').send({ email: org.users.supervisor.email, password: PASSWORD })).status).toBe(401);
    await signIn(h, org.users.supervisor.email, 'supervisor keeps the board level');
    expect((await h.http().post('/api/auth/refresh').send({ refreshToken: before.refreshToken })).status).toBe(401);
  });

  it('refuses a malformed address with a clear 400', async () => {
    const res = await h.http().post('/api/account/password-reset').send({ email: 'not an address' });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/email must be an e-mail address/);
  });
});

describe('a reset sent by the admin', () => {
  it('mails the person a link; a newer link makes the older one stop working', async () => {
    const person = org.users.lead;
    const send = () => h.http().post(`/api/users/${person.id}/password-reset`).set('Authorization', `Bearer ${admin}`).send({});
    expect((await send()).status).toBe(202);
    const first = tokenOf(linkIn((await waitForMails(mailApi, person.email, 1))[0]!));
    expect((await send()).status).toBe(202);
    const mails = await waitForMails(mailApi, person.email, 2);
    const second = tokenOf(linkIn(mails[1]!));
    expect((await setPassword(first, 'lead sets targets from census')).status).toBe(410);
    expect((await setPassword(second, 'lead sets targets from census')).status).toBe(200);
  });
});

describe('one-time links', () => {
  it('work once: a second use is refused and changes nothing', async () => {
    const { email, token } = await invite('Once Only');
    expect((await setPassword(token, 'first choice of passphrase')).status).toBe(200);
    const again = await setPassword(token, 'second try at a passphrase');
    expect(again.status).toBe(410);
    expect(again.body.message).toBe('This link has already been used; ask for a new one if you still need it');
    await signIn(h, email, 'first choice of passphrase');
  });

  it('expire: a link past its time is refused and sets nothing', async () => {
    const { id, token } = await invite('Too Late');
    await h.db('one_time_tokens').where({ user_id: id }).update({ expires_at: new Date(Date.now() - 1000) });
    const res = await setPassword(token, 'a perfectly good passphrase');
    expect(res.status).toBe(410);
    expect(res.body.message).toBe('This link has expired; ask for a new one');
    expect((await h.http().post('/api/account/link').send({ token })).status).toBe(410);
    expect((await h.db('users').where({ id }).first())!.password_hash).toBeNull();
  });

  it('expire 72 hours after an invitation by default', async () => {
    const { id } = await invite('Seventy Two');
    const row = await h.db('one_time_tokens').where({ user_id: id }).first();
    const hours = (row!.expires_at.getTime() - row!.created_at.getTime()) / 3_600_000;
    expect(hours).toBeCloseTo(72, 2);
  });

  it('refuse a made-up or altered token', async () => {
    const { token } = await invite('Tampered');
    const altered = `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`;
    for (const bad of ['nonsense', altered]) {
      const res = await setPassword(bad, 'a perfectly good passphrase');
      expect(res.status).toBe(400);
      expect(res.body.message).toBe('This link is not valid; check that it was copied whole');
    }
  });
});

describe('the password rule on every path', () => {
  const bad: [string, RegExp][] = [
    ['short pass', /at least 12 characters/],
    [' '.repeat(14), /must not be only spaces/],
    ['qwerty123456', /too common/],
  ];

  it.each(bad)('setting %j through a link is refused and leaves the link usable', async (password, message) => {
    const { token } = await invite('Rule Check');
    const res = await setPassword(token, password);
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual([{ field: 'password', message: expect.stringMatching(message) }]);
    expect((await setPassword(token, 'a perfectly good passphrase')).status).toBe(200);
  });

  it.each(bad)('creating an account with %j is refused', async (password, message) => {
    const res = await h.http().post('/api/users').set('Authorization', `Bearer ${admin}`)
      .send({ email: unique('direct'), name: 'Direct', role: 'client', password });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toMatch(message);
  });
});
