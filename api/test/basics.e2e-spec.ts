import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, PASSWORD, signIn, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;

beforeAll(async () => {
  h = await startApp({ BODY_LIMIT: '64kb' });
  org = await createOrg(h.db, 'Basics');
});
afterAll(() => h.close());

describe('API basics', () => {
  it('reports health with the database checked', async () => {
    const res = await h.http().get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'up' });
  });

  it('refuses unknown fields and names each field at fault', async () => {
    const res = await h.http().post('/api/auth/login').send({ email: 'not-an-address', password: PASSWORD, remember: true });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual(
      expect.arrayContaining([
        { field: 'remember', message: 'property remember should not exist' },
        { field: 'email', message: 'email must be an e-mail address' },
      ]),
    );
  });

  it('refuses malformed JSON with the common error shape', async () => {
    const res = await h.http().post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": "a@b.example",');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ statusCode: 400, error: 'Bad Request', message: 'The request body is not valid JSON' });
  });

  it('refuses a body over the size limit and changes nothing', async () => {
    const { accessToken } = await signIn(h, org.users.admin.email);
    const email = 'huge@basics.example';
    const res = await h
      .http()
      .post('/api/users')
      .set('Authorization', `Bearer ${accessToken}`)
      .send({ email, name: 'x'.repeat(70_000), role: 'client', password: 'long enough pw' });
    expect(res.status).toBe(413);
    expect(res.body.message).toMatch(/larger than the limit/);
    expect(await h.db('users').where({ email }).first()).toBeUndefined();
  });

  it('answers unknown API routes with a JSON 404', async () => {
    const res = await h.http().get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.statusCode).toBe(404);
  });

  it('sends security headers', async () => {
    const res = await h.http().get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('publishes OpenAPI docs that list the sign-in route', async () => {
    const res = await h.http().get('/api/docs-json');
    expect(res.status).toBe(200);
    expect(Object.keys(res.body.paths)).toContain('/api/auth/login');
  });

  it('logs requests but never passwords or tokens', async () => {
    const session = await signIn(h, org.users.lead.email);
    await h.http().get('/api/auth/me').set('Authorization', `Bearer ${session.accessToken}`);
    await h.http().post('/api/auth/refresh').send({ refreshToken: session.refreshToken });
    const log = h.logs.join('');
    expect(log).toContain('/api/auth/login');
    expect(log).toContain('/api/auth/me');
    expect(log).not.toContain(PASSWORD);
    expect(log).not.toContain(session.accessToken);
    expect(log).not.toContain(session.refreshToken.split('.')[1]);
  });
});
