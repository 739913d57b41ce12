// Mail waits in PostgreSQL (pg-boss) until a worker sends it: queued by a server that does
// not work on jobs and then stopped, it is delivered once another instance starts.
import { describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { mailsTo, waitForMails } from '../../test/mail-fake.js';
import { createOrg, signIn, startApp } from './harness.js';

const mailApi = inject('mailFake').apiUrl;

describe('the mail queue', () => {
  it('keeps a message across a restart and delivers it exactly once', async () => {
    const first = await startApp({ RUN_JOBS: 'false' });
    const org = await createOrg(first.db, 'Queuetest');
    const admin = (await signIn(first, org.users.admin.email)).accessToken;
    const email = `queued.${Math.random().toString(36).slice(2, 8)}@queuetest.example`;
    const res = await first.http().post('/api/users/invitations').set('Authorization', `Bearer ${admin}`).send({ email, name: 'Queued Person', role: 'client' });
    expect(res.status).toBe(201);
    await new Promise((r) => setTimeout(r, 1500));
    await first.close();
    expect(await mailsTo(mailApi, email)).toEqual([]);

    const second = await startApp();
    try {
      const mails = await waitForMails(mailApi, email);
      expect(mails[0]!.subject).toMatch(/^You are invited to Queuetest/);
      await new Promise((r) => setTimeout(r, 2500));
      expect(await mailsTo(mailApi, email)).toHaveLength(1);
    } finally {
      await second.close();
    }
  });
});

describe('the mail queue during an outage', () => {
  it('lets the API start while PostgreSQL is down and sends mail once it is back', async () => {
    const { startDatabase, stopDatabase } = await import('./cluster.js');
    stopDatabase();
    let h: Awaited<ReturnType<typeof startApp>> | undefined;
    try {
      h = await startApp();
      expect((await h.http().get('/api/health')).status).toBe(503);
    } finally {
      startDatabase();
    }
    try {
      const org = await createOrg(h.db, 'Outagemail');
      const admin = (await signIn(h, org.users.admin.email)).accessToken;
      const email = `after.outage.${Math.random().toString(36).slice(2, 8)}@queuetest.example`;
      const res = await h.http().post('/api/users/invitations').set('Authorization', `Bearer ${admin}`).send({ email, name: 'After Outage', role: 'lead' });
      expect(res.status).toBe(201);
      expect((await waitForMails(mailApi, email, 1, 40_000))[0]!.subject).toMatch(/^You are invited to Outagemail/);
    } finally {
      await h.close();
    }
  }, 90_000);
});
