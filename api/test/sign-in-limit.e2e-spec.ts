// Issue 8, item 3: a sign-in limit that cannot be walked around. Failures count per
// account (growing delays, capped at 15 minutes) and per address across accounts (a high
// limit); successes never count; X-Forwarded-For is believed only from TRUST_PROXY.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { accountKey } from '../src/auth/device-cookie.js';
import { createOrg, PASSWORD, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let proxied: Harness;
let org: TestOrg;
const ADDRESS_LIMIT = 8;

beforeAll(async () => {
  h = await startApp({ SIGNIN_ADDRESS_LIMIT: String(ADDRESS_LIMIT) });
  proxied = await startApp({ SIGNIN_ADDRESS_LIMIT: String(ADDRESS_LIMIT), TRUST_PROXY: 'loopback' });
  org = await createOrg(h.db, 'Limits');
});
afterAll(async () => {
  await proxied.close();
  await h.close();
});
// Address counters are shared by every test here (all requests come from loopback).
beforeEach(() => h.db('sign_in_failures').where('key', 'like', 'address:%').delete());

let spoofed = 0;
/** A sign-in that claims a new client address every time, as an attacker would. */
function login(app: Harness, email: string, password: string, cookie?: string) {
  spoofed += 1;
  const req = app.http().post('/api/auth/login').set('X-Forwarded-For', `198.51.100.${spoofed % 250}`);
  if (cookie) req.set('Cookie', cookie);
  return req.send({ email, password });
}
async function newUser(): Promise<string> {
  return (await createOrg(h.db, 'Limits')).users.interviewer.email;
}
function expectRetryAfter(res: { status: number; headers: Record<string, string> }, atMost: number) {
  expect(res.status).toBe(429);
  expect(Number(res.headers['retry-after'])).toBeGreaterThanOrEqual(1);
  expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(atMost);
}

describe('per account', () => {
  it('a fresh X-Forwarded-For on every try does not escape the account delay', async () => {
    const email = await newUser();
    const statuses = [];
    for (let i = 0; i < 6; i++) statuses.push((await login(h, email, `guess ${i}`)).status);
    expect(statuses).toEqual([401, 401, 401, 401, 401, 429]);
    const right = await login(h, email, PASSWORD);
    expectRetryAfter(right, 15);
    expect(right.body.message).toMatch(/^Too many failed sign-ins; try again in \d+ seconds$/);
  });

  it('even from addresses a trusted proxy vouches for, the account is held back', async () => {
    const email = await newUser();
    for (let i = 0; i < 5; i++) expect((await login(proxied, email, `guess ${i}`)).status).toBe(401);
    expectRetryAfter(await login(proxied, email, PASSWORD), 15);
  });

  it('twenty parallel guesses get at most the free failures checked; the rest wait', async () => {
    const email = await newUser();
    const replies = await Promise.all(Array.from({ length: 20 }, (_, i) => login(h, email, `parallel ${i}`)));
    const statuses = replies.map((r) => r.status);
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(15);
    for (const r of replies.filter((x) => x.status === 429)) expect(r.headers['retry-after']).toBeDefined();
  });

  it('delays grow but stop at 15 minutes, and end: never a permanent lockout', async () => {
    const email = await newUser();
    const key = `account:${accountKey(email)}`;
    const now = new Date();
    await h.db('sign_in_failures').insert({ key, failures: 500, first_failed_at: now, last_failed_at: now });
    const held = await login(h, email, PASSWORD);
    expectRetryAfter(held, 900);
    expect(Number(held.headers['retry-after'])).toBeGreaterThan(890);
    expect(held.body.message).toBe('Too many failed sign-ins; try again in 15 minutes');
    await h.db('sign_in_failures').where({ key }).update({ last_failed_at: new Date(Date.now() - 901_000) });
    expect((await login(h, email, PASSWORD)).status).toBe(200);
  });

  it('a success resets the count, and successes never count', async () => {
    const email = await newUser();
    for (let round = 0; round < 3; round++) {
      // Only the account's counter is under test here, not the address's (tested below).
      await h.db('sign_in_failures').where('key', 'like', 'address:%').delete();
      for (let i = 0; i < 4; i++) expect((await login(h, email, `guess ${i}`)).status).toBe(401);
      expect((await login(h, email, PASSWORD)).status).toBe(200);
    }
    // Used to be: 10 tries a minute, successes included, then 429.
    for (let i = 0; i < 15; i++) expect((await login(h, email, PASSWORD)).status).toBe(200);
    expect(await h.db('sign_in_failures').where({ key: `account:${accountKey(email)}` }).first()).toBeUndefined();
  });
});

describe('a device that signed in before', () => {
  it('gets a signed, HttpOnly cookie that only the sign-in routes see', async () => {
    const res = await login(h, await newUser(), PASSWORD);
    const cookie = (res.headers['set-cookie'] as unknown as string[])[0]!;
    expect(cookie).toMatch(/^plumbline_device=[\w-]+\.[\w-]+\.[\w-]+;/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Path=\/api\/auth/);
  });

  it('is exempt from the delay an attacker imposes on the account, but has its own', async () => {
    const email = await newUser();
    const first = await login(h, email, PASSWORD);
    const cookie = (first.headers['set-cookie'] as unknown as string[])[0]!.split(';')[0]!;
    for (let i = 0; i < 5; i++) expect((await login(h, email, `attacker ${i}`)).status).toBe(401);
    expect((await login(h, email, PASSWORD)).status).toBe(429);
    expect((await login(h, email, PASSWORD, cookie)).status).toBe(200);
    // The device's own failures still slow it down.
    for (let i = 0; i < 5; i++) expect((await login(h, email, `typo ${i}`, cookie)).status).toBe(401);
    expectRetryAfter(await login(h, email, PASSWORD, cookie), 15);
  });

  it('counts only for the accounts that signed in on it, and a forged cookie counts for nothing', async () => {
    const owner = await newUser();
    const victim = await newUser();
    const first = await login(h, owner, PASSWORD);
    const cookie = (first.headers['set-cookie'] as unknown as string[])[0]!.split(';')[0]!;
    for (let i = 0; i < 5; i++) expect((await login(h, victim, `guess ${i}`, cookie)).status).toBe(401);
    expect((await login(h, victim, PASSWORD, cookie)).status).toBe(429);
    const forged = cookie.slice(0, -4) + (cookie.endsWith('AAAA') ? 'BBBB' : 'AAAA');
    expect((await login(h, victim, PASSWORD, forged)).status).toBe(429);
  });
});

describe('per address, across accounts', () => {
  it('many accounts from one address are limited, whatever X-Forwarded-For says', async () => {
    const statuses = [];
    for (let i = 0; i < ADDRESS_LIMIT; i++) statuses.push((await login(h, await newUser(), 'wrong password')).status);
    expect(statuses).toEqual(Array(ADDRESS_LIMIT).fill(401));
    const next = await login(h, await newUser(), PASSWORD);
    expectRetryAfter(next, 900);
    expect(next.body.message).toMatch(/^Too many failed sign-ins; try again in 15 minutes$/);
  });

  it('successes from a shared address never count toward its limit', async () => {
    for (let i = 0; i < ADDRESS_LIMIT * 2; i++) expect((await login(h, org.users.lead.email, PASSWORD)).status).toBe(200);
    for (let i = 0; i < ADDRESS_LIMIT - 1; i++) expect((await login(h, await newUser(), 'wrong')).status).toBe(401);
    expect((await login(h, org.users.supervisor.email, PASSWORD)).status).toBe(200);
  });

  it('with TRUST_PROXY set, the address the proxy names is the one counted', async () => {
    const from = (address: string, email: string, password: string) =>
      proxied.http().post('/api/auth/login').set('X-Forwarded-For', address).send({ email, password });
    for (let i = 0; i < ADDRESS_LIMIT; i++) expect((await from('203.0.113.7', await newUser(), 'wrong')).status).toBe(401);
    expectRetryAfter(await from('203.0.113.7', await newUser(), PASSWORD), 900);
    expect((await from('203.0.113.8', await newUser(), PASSWORD)).status).toBe(200);
  });
});
