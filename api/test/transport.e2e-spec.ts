// Issue 8, item 9: HSTS only over HTTPS, and the API documentation can be switched off.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, PASSWORD, startApp, type Harness } from './harness.js';

let plain: Harness;
let proxied: Harness;
let tlsInFront: Harness;
let noDocs: Harness;

beforeAll(async () => {
  plain = await startApp();
  proxied = await startApp({ TRUST_PROXY: 'loopback' });
  tlsInFront = await startApp({ TLS_IN_FRONT: 'true' });
  noDocs = await startApp({ API_DOCS: 'false' });
});
afterAll(async () => {
  for (const h of [noDocs, tlsInFront, proxied, plain]) await h.close();
});

const HSTS = 'strict-transport-security';

describe('Strict-Transport-Security', () => {
  it('is not sent over plain HTTP (it used to be, on every answer)', async () => {
    const res = await plain.http().get('/api/health');
    expect(res.headers[HSTS]).toBeUndefined();
  });

  it('is not sent when an untrusted client merely claims X-Forwarded-Proto: https', async () => {
    const res = await plain.http().get('/api/health').set('X-Forwarded-Proto', 'https');
    expect(res.headers[HSTS]).toBeUndefined();
  });

  it('is sent when a trusted proxy says the request came over HTTPS', async () => {
    const secure = await proxied.http().get('/api/health').set('X-Forwarded-Proto', 'https');
    expect(secure.headers[HSTS]).toBe('max-age=31536000; includeSubDomains');
    const insecure = await proxied.http().get('/api/health').set('X-Forwarded-Proto', 'http');
    expect(insecure.headers[HSTS]).toBeUndefined();
  });

  it('is sent on every answer when TLS_IN_FRONT says TLS ends in front of the API', async () => {
    const res = await tlsInFront.http().get('/api/health');
    expect(res.headers[HSTS]).toBe('max-age=31536000; includeSubDomains');
  });

  it('goes with a Secure device cookie over HTTPS, and a plain one over HTTP', async () => {
    const { users } = await createOrg(plain.db, 'Transport');
    const body = { email: users.interviewer.email, password: PASSWORD };
    const cookie = async (h: Harness) => ((await h.http().post('/api/auth/login').send(body)).headers['set-cookie'] as unknown as string[])[0]!;
    expect(await cookie(tlsInFront)).toMatch(/; Secure/);
    expect(await cookie(plain)).not.toMatch(/Secure/);
  });
});

describe('API documentation', () => {
  it('is served by default', async () => {
    expect((await plain.http().get('/api/docs-json')).status).toBe(200);
  });

  it('is gone with API_DOCS=false', async () => {
    expect((await noDocs.http().get('/api/docs-json')).status).toBe(404);
    expect((await noDocs.http().get('/api/docs')).status).toBe(404);
    expect((await noDocs.http().get('/api/health')).status).toBe(200);
  });
});
