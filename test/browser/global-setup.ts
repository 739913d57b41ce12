// Starts the built API (serving the built PWA) on the test database with the demo
// data seeded, and the local mail fake it sends to, for the browser suite. The bootstrap
// builds both halves first.
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { TestProject } from 'vitest/node';
import { migrateLatest } from '../../scripts/migrate.js';
import { startMailFake } from '../mail-fake.js';

const root = resolve(import.meta.dirname, '../..');
let server: ChildProcess | undefined;
let stopMail: (() => Promise<void>) | undefined;

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    mailApiUrl: string;
  }
}

export async function setup(project: TestProject): Promise<void> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl || !/_test(\?|$)/.test(databaseUrl)) throw new Error('DATABASE_URL must name a *_test database: run through `npm test`');
  for (const file of ['api/dist/main.js', 'api/dist/demo/seed.js', 'pwa/dist/index.html']) {
    if (!existsSync(join(root, file))) throw new Error(`${file} is missing: build first (npm test does)`);
  }
  await migrateLatest(databaseUrl);
  execFileSync(process.execPath, [join(root, 'api/dist/demo/seed.js')], { env: process.env, stdio: 'inherit' });

  const mail = await startMailFake();
  stopMail = mail.stop;
  const port = Number(process.env.BROWSER_TEST_PORT ?? 3917);
  const baseUrl = `http://127.0.0.1:${port}`;
  server = spawn(process.execPath, [join(root, 'api/dist/main.js')], {
    env: {
      ...process.env,
      HOST: '127.0.0.1',
      PORT: String(port),
      PWA_DIST: join(root, 'pwa/dist'),
      JWT_SECRET: 'browser-suite-secret-0123456789abcdef',
      LOG_LEVEL: 'warn',
      SMTP_URL: mail.smtpUrl,
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  for (let i = 0; i < 100; i++) {
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    if (server.exitCode !== null) throw new Error(`the API exited with code ${server.exitCode} during start-up`);
    await new Promise((r) => setTimeout(r, 200));
  }
  project.provide('baseUrl', baseUrl);
  project.provide('mailApiUrl', mail.apiUrl);
}

export async function teardown(): Promise<void> {
  server?.kill('SIGTERM');
  await stopMail?.();
}
