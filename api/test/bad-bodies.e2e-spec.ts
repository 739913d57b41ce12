// Bodies that once answered 500 or held the server: each is refused with a short 400 (or 415)
// in the common error shape before validation walks it, and nothing is stored.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BODY_SHAPE } from '../src/common/middleware/body-shape.js';
import { MAX_LISTED_PROBLEMS } from '../src/common/validation.js';
import { client } from './fieldwork-helpers.js';
import { createOrg, PASSWORD, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let org: TestOrg;
let lead: Awaited<ReturnType<typeof client>>;

beforeAll(async () => {
  h = await startApp();
  org = await createOrg(h.db, 'Bodies');
  lead = await client(h, org, 'lead');
});
afterAll(() => h.close());

const postJson = (path: string, text: string) => h.http().post(path).set('Content-Type', 'application/json').send(text);

describe('bodies too wide or too deep', () => {
  it('refuses a sign-in with 90,000 unknown fields in a short answer', async () => {
    const fields = Array.from({ length: 90_000 }, (_, i) => `"f${i}":1`).join(',');
    const res = await postJson('/api/auth/login', `{"email":"${org.users.lead.email}","password":"${PASSWORD}",${fields}}`);
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: `The request body has 90002 fields; at most ${BODY_SHAPE.maxFields} are accepted`,
    });
    expect(res.text.length).toBeLessThan(300);
  });

  it('keeps a long list of problems short: the first few, and how many more', async () => {
    const wrong = Object.fromEntries(Array.from({ length: 90 }, (_, i) => [`f${i}`, 1]));
    const res = await h.http().post('/api/auth/login').send({ email: 'x', password: '', ...wrong });
    expect(res.status).toBe(400);
    expect(res.body.fields).toHaveLength(MAX_LISTED_PROBLEMS);
    expect(res.body.message).toMatch(/; and 72 more problems$/);
  });

  it.each([
    ['an object', '{"a":', '}'],
    ['an array', '[', ']'],
  ])('refuses JSON nested 5,000 levels deep in %s, on sign-in and elsewhere', async (_kind, open, close) => {
    const deep = `${open.repeat(5000)}1${close.repeat(5000)}`;
    const signIn = await postJson('/api/auth/login', `{"email":"a@b.example","password":"p","x":${deep}}`);
    expect(signIn.status).toBe(400);
    expect(signIn.body.message).toBe(`The request body is nested more than ${BODY_SHAPE.maxDepth} levels deep`);
    const sync = await h
      .http()
      .post(`/api/projects/${org.projectId}/interviews/sync`)
      .set('Authorization', `Bearer ${lead.token}`)
      .set('Content-Type', 'application/json')
      .send(`{"interviews":[${deep}]}`);
    expect(sync.status).toBe(400);
    expect(sync.body.statusCode).toBe(400);
    const health = await h.http().get('/api/health');
    expect(health.status).toBe(200);
  });

  it('refuses a body of more values than any real request holds', async () => {
    const res = await lead.put(`/api/projects/${org.projectId}/targets`, { variables: Array.from({ length: 70_000 }, () => 0) });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe(`The request body holds more than ${BODY_SHAPE.maxValues} values`);
  });
});

describe('NUL characters and content types', () => {
  it('says a lone JSON string is not a request, rather than not JSON', async () => {
    const res = await postJson('/api/auth/login', '"plumbline"');
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('The request body must be a JSON object or list');
    expect((await postJson('/api/auth/login', '{"email":')).body.message).toBe('The request body is not valid JSON');
  });

  it('refuses a NUL character in a text field, naming the field, and stores nothing', async () => {
    const res = await lead.post('/api/projects', {
      name: 'Tram\u0000 study',
      fieldStart: '2026-11-16',
      fieldEnd: '2026-12-06',
      targetSize: 100,
      headlineQuestion: 'Support?',
    });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual([{ field: 'name', message: 'name must not contain the NUL character' }]);
    expect(await h.db('projects').where({ organisation_id: org.id }).whereILike('name', 'Tram%').first()).toBeUndefined();
  });

  it.each([
    ['a project topic', 'patch', '', { topic: 'a\u0000' }, 'topic'],
    ['a headline question', 'patch', '', { headlineQuestion: '\u0000' }, 'headlineQuestion'],
    ['a variable name', 'put', '/targets', { variables: [{ name: 'a\u0000', categories: [{ label: 'x', share: 1 }] }] }, 'variables.0.name'],
    ['a category label', 'put', '/targets', { variables: [{ name: 'age', categories: [{ label: 'x\u0000', share: 1 }] }] }, 'variables.0.categories.0.label'],
  ] as const)('refuses a NUL character in %s', async (_what, method, suffix, body, field) => {
    const res = await lead[method](`/api/projects/${org.projectId}${suffix}`, body);
    expect(res.status).toBe(400);
    expect(res.body.fields.map((f: { field: string }) => f.field)).toEqual([field]);
  });

  it('refuses a NUL character in a person’s name or e-mail address, and in a sign-in', async () => {
    const admin = await client(h, org, 'admin');
    const person = { email: `nul.${org.id.slice(0, 8)}@bodies.example`, name: 'A\u0000B', role: 'client', password: 'a long enough password' };
    expect((await admin.post('/api/users', person)).body.fields).toEqual([{ field: 'name', message: 'name must not contain the NUL character' }]);
    expect((await admin.post('/api/users', { ...person, name: 'AB', email: `nul\u0000@bodies.example` })).status).toBe(400);
    const signIn = await h.http().post('/api/auth/login').send({ email: `a\u0000@bodies.example`, password: PASSWORD });
    expect(signIn.status).toBe(400);
  });

  it('answers 415 for a JSON route sent another content type, naming both', async () => {
    const body = JSON.stringify({ email: org.users.lead.email, password: PASSWORD });
    const res = await h.http().post('/api/auth/login').set('Content-Type', 'text/plain').send(body);
    expect(res.status).toBe(415);
    expect(res.body).toEqual({
      statusCode: 415,
      error: 'Unsupported Media Type',
      message: 'This request takes application/json; its body was sent as text/plain',
    });
    const form = await h.http().post('/api/auth/login').type('form').send({ email: org.users.lead.email, password: PASSWORD });
    expect(form.status).toBe(415);
  });

  it('answers 415 for a targets file sent as JSON, and still reads one sent as a form', async () => {
    const res = await lead.post(`/api/projects/${org.projectId}/targets/parse`, { file: 'variable,category,share' });
    expect(res.status).toBe(415);
    expect(res.body.message).toBe('This request takes multipart/form-data; its body was sent as application/json');
    const ok = await lead.upload(`/api/projects/${org.projectId}/targets/parse`, 'variable,category,share\nage,young,1\nage,old,1\n');
    expect(ok.status).toBe(200);
  });
});
