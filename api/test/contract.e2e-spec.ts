// The answers the server really sends match the OpenAPI document the client's types are
// generated from (pwa/src/lib/api-types.ts): every route, with its documented success
// status, and no field the document leaves out.
import type { OpenAPIObject } from '@nestjs/swagger';
import { randomUUID } from 'node:crypto';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildOpenApiDocument } from '../src/openapi/openapi-document.js';
import { client, complete, pick, TARGETS, type Targets } from './fieldwork-helpers.js';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { conformanceProblems, responseSchema } from './openapi-conformance.js';

type Api = Awaited<ReturnType<typeof client>>;

let h: Harness;
let doc: OpenAPIObject;
let org: TestOrg;
let lead: Api;
let supervisor: Api;
let interviewer: Api;
let targets: Targets;
const project = () => `/api/projects/${org.projectId}`;

/** The answer has the documented status and matches the documented schema exactly. */
function conforms(res: Response, method: string, path: string, status: number) {
  expect(res.status, JSON.stringify(res.body)).toBe(status);
  expect(conformanceProblems(doc, responseSchema(doc, method, path, status), res.body)).toEqual([]);
}

beforeAll(async () => {
  h = await startApp();
  doc = buildOpenApiDocument(h.app);
  org = await createOrg(h.db, 'Contract');
  lead = await client(h, org, 'lead');
  supervisor = await client(h, org, 'supervisor');
  interviewer = await client(h, org, 'interviewer');
});
afterAll(() => h.close());

describe('answers match the OpenAPI document', () => {
  it('checks what it is given: an undocumented field or a wrong type is named', () => {
    const schema = responseSchema(doc, 'get', '/api/health', 200);
    expect(conformanceProblems(doc, schema, { status: 'ok', database: 'up', extra: 1 })).toEqual(['body.extra is not in the document']);
    expect(conformanceProblems(doc, schema, { status: 'ok' })).toEqual(['body.database is missing']);
    expect(conformanceProblems(doc, responseSchema(doc, 'get', '/api/projects/{id}', 200), { ...sampleProject(), targetSize: '100' })).toEqual(['body.targetSize is not a number']);
  });

  it('health and sign-in', async () => {
    conforms(await h.http().get('/api/health'), 'get', '/api/health', 200);
    const login = await h.http().post('/api/auth/login').send({ email: org.users.client.email, password: 'correct horse battery' });
    conforms(login, 'post', '/api/auth/login', 200);
    const refreshed = await h.http().post('/api/auth/refresh').send({ refreshToken: login.body.refreshToken });
    conforms(refreshed, 'post', '/api/auth/refresh', 200);
    conforms(await h.http().get('/api/auth/me').set({ Authorization: `Bearer ${refreshed.body.accessToken}` }), 'get', '/api/auth/me', 200);
    const out = await h.http().post('/api/auth/logout').send({ refreshToken: refreshed.body.refreshToken });
    expect(out.status).toBe(204);
    expect(doc.paths['/api/auth/logout']?.post?.responses['204']).toBeDefined();
  });

  it('people', async () => {
    const admin = await client(h, org, 'admin');
    conforms(await admin.get('/api/users'), 'get', '/api/users', 200);
    conforms(await admin.get(`/api/users/${org.users.interviewer.id}`), 'get', '/api/users/{id}', 200);
    const created = await admin.post('/api/users', { email: `new.${randomUUID().slice(0, 8)}@contract.example`, name: 'New Interviewer', role: 'interviewer', password: `long-enough-${randomUUID()}` });
    conforms(created, 'post', '/api/users', 201);
  });

  it('projects and members', async () => {
    conforms(await lead.get('/api/projects'), 'get', '/api/projects', 200);
    conforms(await lead.post('/api/projects', { name: 'Contract check', fieldStart: '2026-12-01', fieldEnd: '2026-12-20', targetSize: 60, headlineQuestion: 'Keep it?', timeZone: 'Europe/London' }), 'post', '/api/projects', 201);
    conforms(await lead.patch(project(), { targetSize: 60, headlineQuestion: 'Support?' }), 'patch', '/api/projects/{id}', 200);
    conforms(await lead.get(project()), 'get', '/api/projects/{id}', 200);
    conforms(await lead.put(`${project()}/members`, { userIds: [org.users.interviewer.id, org.users.client.id, org.users.supervisor.id] }), 'put', '/api/projects/{id}/members', 200);
    conforms(await lead.get(`${project()}/members`), 'get', '/api/projects/{id}/members', 200);
  });

  it('targets, cells and the quota board', async () => {
    const csv = 'variable,category,share\nage,18-34,30\nage,35+,70\nage × sex,18-34 × female,16\nage × sex,18-34 × male,14\nage × sex,35+ × female,36\nage × sex,35+ × male,34\nsex,female,52\nsex,male,48\n';
    conforms(await lead.upload(`${project()}/targets/parse`, csv), 'post', '/api/projects/{projectId}/targets/parse', 200);
    conforms(await lead.upload(`${project()}/targets/parse`, 'variable,category,share\nregion,North,1\nregion,South,1\n'), 'post', '/api/projects/{projectId}/targets/parse', 200);
    conforms(await lead.post(`${project()}/targets/preview`, TARGETS), 'post', '/api/projects/{projectId}/targets/preview', 200);
    const saved = await lead.put(`${project()}/targets`, TARGETS);
    conforms(saved, 'put', '/api/projects/{projectId}/targets', 200);
    targets = saved.body;
    conforms(await lead.get(`${project()}/targets`), 'get', '/api/projects/{projectId}/targets', 200);
    const cells = await interviewer.get(`${project()}/cells`);
    conforms(cells, 'get', '/api/projects/{projectId}/cells', 200);
    const cellId = cells.body.cells[0].id as string;
    conforms(await supervisor.post(`${project()}/cells/${cellId}/close`), 'post', '/api/projects/{projectId}/cells/{cellId}/close', 200);
    conforms(await supervisor.get(`${project()}/quota-board`), 'get', '/api/projects/{projectId}/quota-board', 200);
    conforms(await supervisor.post(`${project()}/cells/${cellId}/reopen`), 'post', '/api/projects/{projectId}/cells/{cellId}/reopen', 200);
  });

  it('sync, flags, export and the balance, before and after weighting', async () => {
    conforms(await lead.get(`${project()}/balance`), 'get', '/api/projects/{projectId}/balance', 200);
    const batch = [];
    for (const age of ['18-34', '35-59', '60+']) for (const sex of ['female', 'male']) for (const region of ['North', 'South', 'Coast']) {
      for (let i = 0; i < 3; i++) batch.push(complete(pick(targets, { age, sex, region }), (batch.length % 3) !== 0, '2026-12-02T10:00:00.000Z'));
    }
    // Outside the field dates (flagged), sent twice (duplicate) and unreadable (rejected).
    const late = complete(pick(targets, { age: '60+', sex: 'male', region: 'Coast' }), true, '2027-03-01T10:00:00.000Z');
    const reply = await interviewer.post(`${project()}/interviews/sync`, { interviews: [...batch, late, late, { ...late, id: 'not-an-id' }] });
    conforms(reply, 'post', '/api/projects/{projectId}/interviews/sync', 200);
    expect(reply.body.results.map((r: { status: string }) => r.status).slice(-3)).toEqual(['accepted', 'duplicate', 'rejected']);
    conforms(await supervisor.get(`${project()}/interviews/flags`), 'get', '/api/projects/{projectId}/interviews/flags', 200);
    const exported = await lead.get(`${project()}/interviews/export.csv`);
    expect(exported.status).toBe(200);
    expect(exported.headers['content-type']).toMatch(/^text\/csv/);
    expect(Object.keys(doc.paths['/api/projects/{projectId}/interviews/export.csv']?.get?.responses['200'] ?? {})).toContain('content');
    const balance = await lead.get(`${project()}/balance`);
    conforms(balance, 'get', '/api/projects/{projectId}/balance', 200);
    expect(balance.body.outcome.interval).toHaveLength(2);
  });

  it('assignments, the interviewer\'s own progress, archive and restore', async () => {
    const cells = (await lead.get(`${project()}/cells`)).body.cells as { id: string }[];
    const path = `${project()}/assignments/${org.users.interviewer.id}`;
    conforms(await supervisor.put(path, { target: 30, cellIds: [cells[0]!.id] }), 'put', '/api/projects/{projectId}/assignments/{userId}', 200);
    conforms(await lead.get(`${project()}/assignments`), 'get', '/api/projects/{projectId}/assignments', 200);
    conforms(await interviewer.get('/api/projects'), 'get', '/api/projects', 200);
    const cleared = await h.http().delete(path).set({ Authorization: `Bearer ${lead.token}` });
    expect(cleared.status).toBe(204);
    expect(doc.paths['/api/projects/{projectId}/assignments/{userId}']?.delete?.responses['204']).toBeDefined();
    await lead.patch(project(), { status: 'closed' });
    conforms(await lead.post(`${project()}/archive`), 'post', '/api/projects/{id}/archive', 200);
    conforms(await lead.get('/api/projects?archived=true'), 'get', '/api/projects', 200);
    conforms(await lead.post(`${project()}/restore`), 'post', '/api/projects/{id}/restore', 200);
  });
});

function sampleProject() {
  return { id: randomUUID(), name: 'x', topic: '', fieldStart: null, fieldEnd: null, targetSize: 1, status: 'setup', headlineQuestion: 'q?', timeZone: 'UTC', archivedAt: null };
}

