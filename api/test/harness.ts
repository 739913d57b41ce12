// Starts the real application on the test database, plus helpers that create an
// organisation of users directly in the database for each test file.
import type { NestExpressApplication } from '@nestjs/platform-express';
import knex, { type Knex } from 'knex';
import { randomUUID } from 'node:crypto';
import { Writable } from 'node:stream';
import request from 'supertest';
import { inject } from 'vitest';
import { createApp } from '../src/app.factory.js';
import { hashPassword } from '../src/auth/password.js';
import type { Role } from '../src/common/roles.js';
import { loadConfig, type AppConfig } from '../src/config/config.js';

export const TEST_SECRET = 'test-secret-for-the-api-suites-only-0123456789';
export const PASSWORD = 'correct horse battery';

export interface Harness {
  app: NestExpressApplication;
  db: Knex;
  config: AppConfig;
  logs: string[];
  http: () => ReturnType<typeof request>;
  close: () => Promise<void>;
}

export async function startApp(env: Record<string, string> = {}): Promise<Harness> {
  const config = loadConfig({
    DATABASE_URL: process.env.DATABASE_URL,
    JWT_SECRET: TEST_SECRET,
    LOG_LEVEL: 'info',
    SMTP_URL: inject('mailFake').smtpUrl,
    ...env,
  });
  const logs: string[] = [];
  const sink = new Writable({
    write(chunk, _encoding, done) {
      logs.push(String(chunk));
      done();
    },
  });
  const app = await createApp(config, sink);
  await app.init();
  const db = knex({ client: 'pg', connection: config.databaseUrl });
  return {
    app,
    db,
    config,
    logs,
    http: () => request(app.getHttpServer()),
    close: async () => {
      await app.close();
      await db.destroy();
    },
  };
}

export interface TestOrg {
  id: string;
  users: Record<Role, { id: string; email: string }>;
  projectId: string;
}

/** One organisation with a user of every role and one project (interviewer and client are members). */
export async function createOrg(db: Knex, label: string): Promise<TestOrg> {
  const tag = randomUUID().slice(0, 8);
  const passwordHash = await hashPassword(PASSWORD);
  const [org] = await db('organisations').insert({ name: `${label} ${tag}` }).returning('*');
  const roles: Role[] = ['admin', 'lead', 'supervisor', 'interviewer', 'client'];
  const users = {} as TestOrg['users'];
  for (const role of roles) {
    const email = `${role}.${tag}@${label.toLowerCase()}.example`;
    const [row] = await db('users')
      .insert({ organisation_id: org!.id, email, name: `${role} ${tag}`, role, password_hash: passwordHash })
      .returning('*');
    users[role] = { id: row!.id, email };
  }
  const [project] = await db('projects')
    .insert({ organisation_id: org!.id, name: `Project ${tag}`, target_size: 100 })
    .returning('*');
  await db('project_members').insert([
    { project_id: project!.id, user_id: users.interviewer.id },
    { project_id: project!.id, user_id: users.client.id },
  ]);
  return { id: org!.id, users, projectId: project!.id };
}

export async function signIn(h: Harness, email: string, password = PASSWORD) {
  const res = await h.http().post('/api/auth/login').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { accessToken: string; refreshToken: string; user: { id: string; role: Role } };
}
