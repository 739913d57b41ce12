// Brings the test database to the latest migration before the API suites run, and starts
// the local mail fake (maildev on loopback) that the suites' servers send mail to.
// The bootstrap (scripts/test.sh) creates the database fresh; the demo database is never used.
import type { TestProject } from 'vitest/node';
import { migrateLatest } from '../../scripts/migrate.js';
import { startMailFake, type MailFakeAddress } from '../../test/mail-fake.js';

declare module 'vitest' {
  export interface ProvidedContext {
    mailFake: MailFakeAddress;
  }
}

let stopMail: (() => Promise<void>) | undefined;

export async function setup(project: TestProject): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: run the API suites through `npm test`');
  if (!/_test(\?|$)/.test(url)) throw new Error('DATABASE_URL must name a database ending in _test; refusing to touch other data');
  await migrateLatest(url);
  const fake = await startMailFake();
  stopMail = fake.stop;
  project.provide('mailFake', { smtpUrl: fake.smtpUrl, apiUrl: fake.apiUrl });
}

export async function teardown(): Promise<void> {
  await stopMail?.();
}
