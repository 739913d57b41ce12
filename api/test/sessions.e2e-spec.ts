// Issue 8, items 1 and 2: revocation that bites at once, and parallel refreshes that keep
// the sign-in. Each test starts with the request that used to go wrong.
import { sign } from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REFRESH_REUSE_GRACE_SECONDS } from '../src/auth/refresh-tokens.repository.js';
import { createOrg, signIn, startApp, TEST_SECRET, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Sessions');
});
afterAll(() => h.close());

const me = (accessToken: string) => h.http().get('/api/auth/me').set('Authorization', `Bearer ${accessToken}`);
const refresh = (refreshToken: string) => h.http().post('/api/auth/refresh').send({ refreshToken });
/** Moves a spent refresh token's rotation back in time, past the grace period. */
const pastGrace = (refreshToken: string) =>
  h.db('refresh_tokens')
    .where({ id: refreshToken.split('.')[0] })
    .update({ replaced_at: new Date(Date.now() - (REFRESH_REUSE_GRACE_SECONDS + 1) * 1000) });

describe('revocation takes effect at once', () => {
  it('an access token stops working as soon as its sign-in is signed out', async () => {
    const { accessToken, refreshToken } = await signIn(h, org.users.supervisor.email);
    expect((await me(accessToken)).status).toBe(200);
    expect((await h.http().post('/api/auth/logout').send({ refreshToken })).status).toBe(204);
    const after = await me(accessToken);
    expect(after.status).toBe(401);
    expect(after.body.message).toBe('This sign-in was ended; sign in again');
    // Also on the routes that do the work, not only on /me.
    const projects = await h.http().get('/api/projects').set('Authorization', `Bearer ${accessToken}`);
    expect(projects.status).toBe(401);
  });

  it('signing out on one device leaves the same person signed in on another', async () => {
    const phone = await signIn(h, org.users.interviewer.email);
    const tablet = await signIn(h, org.users.interviewer.email);
    await h.http().post('/api/auth/logout').send({ refreshToken: phone.refreshToken });
    expect((await me(phone.accessToken)).status).toBe(401);
    expect((await me(tablet.accessToken)).status).toBe(200);
  });

  it('reuse of a rotated refresh token after the grace ends every access token of that sign-in at once', async () => {
    const first = await signIn(h, org.users.lead.email);
    const second = await refresh(first.refreshToken);
    expect(second.status).toBe(200);
    await pastGrace(first.refreshToken);
    const reuse = await refresh(first.refreshToken);
    expect(reuse.status).toBe(401);
    expect(reuse.body.message).toMatch(/already used/);
    expect((await me(first.accessToken)).status).toBe(401);
    expect((await me(second.body.accessToken)).status).toBe(401);
    expect((await refresh(second.body.refreshToken)).status).toBe(401);
  });

  it('refuses a signed access token that names no sign-in, or a made-up one', async () => {
    const base = { sub: org.users.admin.id, org: org.id, role: 'admin' };
    const noSid = sign(base, TEST_SECRET, { expiresIn: 60 });
    const madeUp = sign({ ...base, sid: '00000000-0000-4000-8000-000000000000' }, TEST_SECRET, { expiresIn: 60 });
    const notUuid = sign({ ...base, sid: 'x' }, TEST_SECRET, { expiresIn: 60 });
    expect((await me(noSid)).status).toBe(401);
    expect((await me(notUuid)).status).toBe(401);
    expect((await me(madeUp)).status).toBe(401);
  });

  it("another user's sign-in id does not make a token valid", async () => {
    const lead = await signIn(h, org.users.lead.email);
    const leadSid = (JSON.parse(Buffer.from(lead.accessToken.split('.')[1]!, 'base64url').toString()) as { sid: string }).sid;
    const forgedForAdmin = sign({ sub: org.users.admin.id, org: org.id, role: 'admin', sid: leadSid }, TEST_SECRET, { expiresIn: 60 });
    expect((await me(forgedForAdmin)).status).toBe(401);
  });
});

describe('parallel refreshes keep the sign-in', () => {
  it('three parallel refreshes of one token all succeed, and the sign-in goes on', async () => {
    const { accessToken, refreshToken } = await signIn(h, org.users.admin.email);
    const replies = await Promise.all([refresh(refreshToken), refresh(refreshToken), refresh(refreshToken)]);
    expect(replies.map((r) => r.status)).toEqual([200, 200, 200]);
    const successors = replies.map((r) => r.body.refreshToken as string);
    expect(new Set(successors).size).toBe(3);
    // Nothing was revoked: the old access token and every new one still work.
    expect((await me(accessToken)).status).toBe(200);
    for (const r of replies) expect((await me(r.body.accessToken as string)).status).toBe(200);
    // Whichever successor the client kept, it rotates normally.
    for (const token of successors) expect((await refresh(token)).status).toBe(200);
  });

  it('a retry of a refresh whose reply was lost gets a fresh token within the grace period', async () => {
    const { refreshToken } = await signIn(h, org.users.client.email);
    expect((await refresh(refreshToken)).status).toBe(200);
    const retry = await refresh(refreshToken);
    expect(retry.status).toBe(200);
    expect((await me(retry.body.accessToken as string)).status).toBe(200);
  });

  it('the grace period does not outlive itself: reuse after it still revokes the family', async () => {
    const { refreshToken } = await signIn(h, org.users.interviewer.email);
    const next = await refresh(refreshToken);
    const inGrace = await refresh(refreshToken);
    expect(inGrace.status).toBe(200);
    await pastGrace(refreshToken);
    expect((await refresh(refreshToken)).status).toBe(401);
    expect((await refresh(next.body.refreshToken as string)).status).toBe(401);
    expect((await me(inGrace.body.accessToken as string)).status).toBe(401);
  });

  it('a signed-out sign-in cannot be revived by a refresh in the grace period', async () => {
    const { refreshToken } = await signIn(h, org.users.supervisor.email);
    await refresh(refreshToken);
    await h.http().post('/api/auth/logout').send({ refreshToken });
    const res = await refresh(refreshToken);
    expect(res.status).toBe(401);
    expect(res.body.message).toMatch(/ended/);
  });
});
