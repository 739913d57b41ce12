import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOrg, signIn, startApp, type Harness, type TestOrg } from './harness.js';

let h: Harness;
let north: TestOrg;
let south: TestOrg;

beforeAll(async () => {
  h = await startApp();
  north = await createOrg(h.db, 'North');
  south = await createOrg(h.db, 'South');
});
afterAll(() => h.close());

async function as(org: TestOrg, role: keyof TestOrg['users']) {
  const { accessToken } = await signIn(h, org.users[role].email);
  return {
    get: (path: string) => h.http().get(path).set('Authorization', `Bearer ${accessToken}`),
    post: (path: string, body: object) => h.http().post(path).set('Authorization', `Bearer ${accessToken}`).send(body),
  };
}

describe('roles', () => {
  it('refuses a route to a role that lacks it, naming the roles needed', async () => {
    const interviewer = await as(north, 'interviewer');
    const res = await interviewer.get('/api/users');
    expect(res.status).toBe(403);
    expect(res.body).toEqual({ statusCode: 403, error: 'Forbidden', message: 'This needs one of the roles: admin, lead' });
  });

  it('refuses a client creating an account, and nothing is created', async () => {
    const client = await as(north, 'client');
    const email = 'sneaky@north.example';
    const res = await client.post('/api/users', { email, name: 'Sneaky', role: 'admin', password: 'longenough123' });
    expect(res.status).toBe(403);
    expect(await h.db('users').where({ email }).first()).toBeUndefined();
  });

  it('lets an admin create an account that can sign in, and refuses a duplicate e-mail', async () => {
    const admin = await as(north, 'admin');
    const email = `new.${Date.now()}@north.example`;
    const body = { email, name: 'Nia Penrose', role: 'interviewer', password: 'a long password' };
    const created = await admin.post('/api/users', body);
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ email, role: 'interviewer', active: true });
    expect(created.body.password_hash).toBeUndefined();
    await signIn(h, email, 'a long password');
    const again = await admin.post('/api/users', { ...body, email: email.toUpperCase() });
    expect(again.status).toBe(409);
    expect(await h.db('users').whereRaw('lower(email) = lower(?)', [email])).toHaveLength(1);
  });
});

describe('organisation scope', () => {
  it('lists only the own organisation’s people', async () => {
    const lead = await as(north, 'lead');
    const res = await lead.get('/api/users');
    expect(res.status).toBe(200);
    const emails = res.body.map((u: { email: string }) => u.email);
    expect(emails).toContain(north.users.admin.email);
    expect(emails).not.toContain(south.users.admin.email);
  });

  it('answers 404, not 403, for another organisation’s user and project ids', async () => {
    const admin = await as(north, 'admin');
    const user = await admin.get(`/api/users/${south.users.lead.id}`);
    expect(user.status).toBe(404);
    expect(user.body.message).toBe('No such user');
    const project = await admin.get(`/api/projects/${south.projectId}`);
    expect(project.status).toBe(404);
    expect(project.body.message).toBe('No such project');
    const own = await admin.get(`/api/projects/${north.projectId}`);
    expect(own.status).toBe(200);
  });

  it('shows interviewers and clients only the projects they are assigned to', async () => {
    const [other] = await h.db('projects').insert({ organisation_id: north.id, name: 'Unassigned', target_size: 10 }).returning('*');
    const interviewer = await as(north, 'interviewer');
    const list = await interviewer.get('/api/projects');
    expect(list.body.map((p: { id: string }) => p.id)).toEqual([north.projectId]);
    expect((await interviewer.get(`/api/projects/${other!.id}`)).status).toBe(404);
    const supervisor = await as(north, 'supervisor');
    const all = await supervisor.get('/api/projects');
    expect(all.body.map((p: { id: string }) => p.id).sort()).toEqual([north.projectId, other!.id].sort());
  });

  it('refuses a malformed id with a clear 400', async () => {
    const admin = await as(north, 'admin');
    const res = await admin.get('/api/projects/not-a-uuid');
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/uuid/i);
  });
});

describe('organisation scope of the fieldwork routes', () => {
  it('answers 404 on every project route for another organisation’s project, and changes nothing', async () => {
    const rivalLead = await as(south, 'lead');
    const rivalSupervisor = await as(south, 'supervisor');
    const rivalInterviewer = await as(south, 'interviewer');
    const base = `/api/projects/${north.projectId}`;
    const reads = ['', '/members', '/targets', '/cells', '/balance', '/interviews/export.csv'];
    for (const path of reads) expect((await rivalLead.get(`${base}${path}`)).status, path).toBe(404);
    expect((await rivalSupervisor.get(`${base}/quota-board`)).status).toBe(404);
    const before = await h.db('projects').where({ id: north.projectId }).first();
    const put = await h.http().put(`${base}/targets`).set('Authorization', `Bearer ${(await signIn(h, south.users.lead.email)).accessToken}`)
      .send({ variables: [{ name: 'sex', categories: [{ label: 'female', share: 1 }, { label: 'male', share: 1 }] }] });
    expect(put.status).toBe(404);
    expect((await rivalLead.post(`${base}/interviews/sync`, { interviews: [] })).status).toBe(403);
    expect((await rivalInterviewer.post(`${base}/interviews/sync`, { interviews: [] })).status).toBe(404);
    expect(await h.db('quota_variables').where({ project_id: north.projectId })).toHaveLength(0);
    expect(await h.db('projects').where({ id: north.projectId }).first()).toEqual(before);
  });
});
