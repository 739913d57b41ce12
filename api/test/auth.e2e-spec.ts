import { sign } from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, PASSWORD, signIn, startApp, TEST_SECRET, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;

beforeAll(async () => {
  h = await startApp({ SIGNIN_FREE_FAILURES: '5' });
  org = await createOrg(h.db, 'Authtest');
});
afterAll(() => h.close());

const refreshTokenCount = async () => Number((await h.db('refresh_tokens').count({ n: '*' }))[0]!.n);

describe('sign-in', () => {
  it('returns tokens and the user with role and organisation, never the password hash', async () => {
    const res = await h.http().post('/api/auth/login').send({ email: org.users.lead.email, password: PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.accessToken).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
    expect(res.body.refreshToken).toEqual(expect.any(String));
    expect(res.body.expiresIn).toBe(900);
    expect(res.body.user).toMatchObject({ email: org.users.lead.email, role: 'lead', organisation: { id: org.id } });
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|password/i);
  });

  it('accepts the e-mail in any letter case', async () => {
    const res = await h.http().post('/api/auth/login').send({ email: org.users.admin.email.toUpperCase(), password: PASSWORD });
    expect(res.status).toBe(200);
  });

  it('refuses a wrong password and an unknown user with the same message, creating no token', async () => {
    const before = await refreshTokenCount();
    const wrong = await h.http().post('/api/auth/login').send({ email: org.users.supervisor.email, password: 'not it at all' });
    const unknown = await h.http().post('/api/auth/login').send({ email: 'nobody@nowhere.example', password: PASSWORD });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual({ statusCode: 401, error: 'Unauthorized', message: 'E-mail or password is not correct' });
    expect(unknown.body.message).toBe(wrong.body.message);
    expect(await refreshTokenCount()).toBe(before);
  });

  it('refuses a disabled account', async () => {
    await h.db('users').where({ id: org.users.client.id }).update({ active: false });
    const res = await h.http().post('/api/auth/login').send({ email: org.users.client.email, password: PASSWORD });
    await h.db('users').where({ id: org.users.client.id }).update({ active: true });
    expect(res.status).toBe(401);
  });

  it('holds back an account after repeated failures, even with the right password afterwards', async () => {
    const email = org.users.interviewer.email;
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      statuses.push((await h.http().post('/api/auth/login').send({ email, password: `guess ${i}` })).status);
    }
    const blocked = await h.http().post('/api/auth/login').send({ email, password: PASSWORD });
    expect(statuses).toEqual([401, 401, 401, 401, 401]);
    expect(blocked.status).toBe(429);
    // The sixth try waits 15 s after the fifth failure (sign-in-policy.ts).
    expect(blocked.body.message).toMatch(/^Too many failed sign-ins; try again in \d+ seconds$/);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    expect(Number(blocked.headers['retry-after'])).toBeLessThanOrEqual(15);
    // Another user from the same address is not locked out by it.
    expect((await h.http().post('/api/auth/login').send({ email: org.users.lead.email, password: PASSWORD })).status).toBe(200);
  });
});

describe('access tokens', () => {
  it('lets a signed-in user read who they are', async () => {
    const { accessToken } = await signIn(h, org.users.supervisor.email);
    const res = await h.http().get('/api/auth/me').set('Authorization', `Bearer ${accessToken}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ email: org.users.supervisor.email, role: 'supervisor' });
  });

  it('refuses a missing, expired, forged or unsigned token', async () => {
    const payload = { sub: org.users.lead.id, org: org.id, role: 'lead' };
    const expired = sign({ ...payload, exp: Math.floor(Date.now() / 1000) - 60 }, TEST_SECRET);
    const forged = sign(payload, 'some-other-secret-that-is-long-enough-0000');
    const unsigned = sign(payload, '', { algorithm: 'none' });
    const missing = await h.http().get('/api/auth/me');
    expect(missing.status).toBe(401);
    expect(missing.body.message).toBe('Sign in first: this needs an access token');
    const res = await h.http().get('/api/auth/me').set('Authorization', `Bearer ${expired}`);
    expect(res.status).toBe(401);
    expect(res.body.message).toMatch(/expired/);
    for (const token of [forged, unsigned, 'garbage']) {
      const r = await h.http().get('/api/auth/me').set('Authorization', `Bearer ${token}`);
      expect(r.status).toBe(401);
      expect(r.body.message).toBe('The access token is not valid');
    }
  });

  it('stops honouring a valid token once its user is disabled', async () => {
    const { accessToken } = await signIn(h, org.users.client.email);
    await h.db('users').where({ id: org.users.client.id }).update({ active: false });
    const res = await h.http().get('/api/auth/me').set('Authorization', `Bearer ${accessToken}`);
    await h.db('users').where({ id: org.users.client.id }).update({ active: true });
    expect(res.status).toBe(401);
  });
});

describe('refresh tokens', () => {
  it('rotate: the new pair works and the old refresh token is spent', async () => {
    const first = await signIn(h, org.users.admin.email);
    const second = await h.http().post('/api/auth/refresh').send({ refreshToken: first.refreshToken });
    expect(second.status).toBe(200);
    expect(second.body.refreshToken).not.toBe(first.refreshToken);
    const me = await h.http().get('/api/auth/me').set('Authorization', `Bearer ${second.body.accessToken}`);
    expect(me.status).toBe(200);
    const third = await h.http().post('/api/auth/refresh').send({ refreshToken: second.body.refreshToken });
    expect(third.status).toBe(200);
  });

  it('reuse of a rotated token after the grace period ends the whole sign-in, including the newest token', async () => {
    const first = await signIn(h, org.users.admin.email);
    const second = await h.http().post('/api/auth/refresh').send({ refreshToken: first.refreshToken });
    await h.db('refresh_tokens').where({ id: first.refreshToken.split('.')[0] }).update({ replaced_at: new Date(Date.now() - 31_000) });
    const reuse = await h.http().post('/api/auth/refresh').send({ refreshToken: first.refreshToken });
    expect(reuse.status).toBe(401);
    expect(reuse.body.message).toMatch(/already used/);
    const afterReuse = await h.http().post('/api/auth/refresh').send({ refreshToken: second.body.refreshToken });
    expect(afterReuse.status).toBe(401);
    // A separate sign-in of the same user is not affected.
    const other = await signIn(h, org.users.admin.email);
    expect((await h.http().post('/api/auth/refresh').send({ refreshToken: other.refreshToken })).status).toBe(200);
  });

  it('refuses malformed, unknown and tampered refresh tokens', async () => {
    const { refreshToken } = await signIn(h, org.users.lead.email);
    const [id] = refreshToken.split('.');
    const tampered = `${id}.${'A'.repeat(43)}`;
    for (const token of ['nonsense', `00000000-0000-4000-8000-000000000000.${'B'.repeat(43)}`, tampered]) {
      const res = await h.http().post('/api/auth/refresh').send({ refreshToken: token });
      expect(res.status).toBe(401);
      expect(res.body.message).toBe('The refresh token is not valid; sign in again');
    }
    // The tampering attempt did not spend the real token.
    expect((await h.http().post('/api/auth/refresh').send({ refreshToken })).status).toBe(200);
  });

  it('refuses an expired refresh token', async () => {
    const { refreshToken } = await signIn(h, org.users.lead.email);
    await h.db('refresh_tokens').where({ id: refreshToken.split('.')[0] }).update({ expires_at: new Date(Date.now() - 1000) });
    const res = await h.http().post('/api/auth/refresh').send({ refreshToken });
    expect(res.status).toBe(401);
    expect(res.body.message).toMatch(/expired/);
  });

  it('sign-out ends the sign-in: its refresh token no longer works', async () => {
    const { refreshToken } = await signIn(h, org.users.supervisor.email);
    const out = await h.http().post('/api/auth/logout').send({ refreshToken });
    expect(out.status).toBe(204);
    const res = await h.http().post('/api/auth/refresh').send({ refreshToken });
    expect(res.status).toBe(401);
    expect(res.body.message).toMatch(/ended/);
  });
});
