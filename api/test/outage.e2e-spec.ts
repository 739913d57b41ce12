// A database outage is an outage: while PostgreSQL is stopped, routes that need it answer
// 503 with Retry-After (never 401, which would tell a device its sign-in is bad), the app
// shell is still served, and the same tokens work again once the database is back.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startDatabase, stopDatabase } from './cluster.js';
import { createOrg, startApp, type Harness, type TestOrg } from './harness.js';
import { client, complete, pick, TARGETS, type Targets } from './fieldwork-helpers.js';

let h: Harness;
let org: TestOrg;
let targets: Targets;
let shell: string;
let interviewer: Awaited<ReturnType<typeof client>>;
let refreshToken: string;

beforeAll(async () => {
  shell = mkdtempSync(join(tmpdir(), 'plumbline-shell-'));
  writeFileSync(join(shell, 'index.html'), '<!doctype html><title>Plumbline</title>');
  h = await startApp({ PWA_DIST: shell });
  org = await createOrg(h.db, 'Outage');
  const lead = await client(h, org, 'lead');
  targets = (await lead.put(`/api/projects/${org.projectId}/targets`, TARGETS)).body;
  interviewer = await client(h, org, 'interviewer');
  const login = await h.http().post('/api/auth/login').send({ email: org.users.interviewer.email, password: 'correct horse battery' });
  refreshToken = login.body.refreshToken;
});
afterAll(async () => {
  startDatabase();
  await h.close();
  rmSync(shell, { recursive: true, force: true });
});

const expectOutage = (res: { status: number; headers: Record<string, string>; body: { message?: string } }) => {
  expect(res.status).toBe(503);
  expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
};

describe('while the database is down', () => {
  const interview = () => complete(pick(targets, { age: '35-59', sex: 'male', region: 'South' }));
  const waiting = { id: '', body: {} as object };

  it('answers 503 with Retry-After for signed-in routes and says the database is down', async () => {
    waiting.body = interview();
    waiting.id = (waiting.body as { id: string }).id;
    stopDatabase();

    const health = await h.http().get('/api/health');
    expectOutage(health);
    expect(health.body.message).toMatch(/database is down/i);

    for (const path of ['/api/projects', `/api/projects/${org.projectId}/cells`, '/api/auth/me']) {
      const res = await interviewer.get(path);
      expectOutage(res);
      expect(res.body.message).toMatch(/database cannot be reached/i);
    }
    expectOutage(await interviewer.post(`/api/projects/${org.projectId}/interviews/sync`, { interviews: [waiting.body] }));
    // Refreshing the sign-in is not refused either: the device keeps its session.
    expectOutage(await h.http().post('/api/auth/refresh').send({ refreshToken }));
  });

  it('still serves the app shell', async () => {
    const res = await h.http().get('/outbox');
    expect(res.status).toBe(200);
    expect(res.text).toContain('<title>Plumbline</title>');
  });

  it('takes the same token and the retried interview once the database is back', async () => {
    startDatabase();
    expect((await h.http().get('/api/health')).status).toBe(200);
    expect((await interviewer.get('/api/projects')).status).toBe(200);
    const sent = await interviewer.post(`/api/projects/${org.projectId}/interviews/sync`, { interviews: [waiting.body] });
    expect(sent.body).toMatchObject({ accepted: 1, duplicates: 0 });
    expect(Number((await h.db('interviews').where({ id: waiting.id }).count({ n: '*' }))[0]!.n)).toBe(1);
    const refreshed = await h.http().post('/api/auth/refresh').send({ refreshToken });
    expect(refreshed.status).toBe(200);
  });
});
