import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import express from 'express';
import { describe, expect, it } from 'vitest';
import { readBulkhead } from './read-bulkhead.js';

/** An app whose GET handler waits until the test lets it answer. */
async function slowApp(limit: number) {
  const app = express();
  let working = 0;
  let most = 0;
  const gates: (() => void)[] = [];
  app.use(readBulkhead(limit));
  app.get('/api/slow', (_req, res) => {
    working += 1;
    most = Math.max(most, working);
    gates.push(() => {
      working -= 1;
      res.json({ ok: true });
    });
  });
  app.post('/api/write', (_req, res) => res.json({ wrote: true }));
  const server = app.listen(0, '127.0.0.1');
  await once(server, 'listening');
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return { base, server, gates, most: () => most, working: () => working };
}

const settle = () => new Promise((r) => setTimeout(r, 50));

describe('reads yield to writes', () => {
  it('works on at most the limit of reads at once, serves the rest in turn, and lets writes straight through', async () => {
    const app = await slowApp(2);
    try {
      const reads = Array.from({ length: 5 }, () => fetch(`${app.base}/api/slow`));
      await settle();
      expect(app.working()).toBe(2);
      expect(await (await fetch(`${app.base}/api/write`, { method: 'POST' })).json()).toEqual({ wrote: true });
      while ((await Promise.race([Promise.all(reads).then(() => 'all'), settle().then(() => 'more')])) === 'more') {
        app.gates.splice(0).forEach((open) => open());
      }
      expect(app.most()).toBe(2);
      expect((await Promise.all(reads)).map((r) => r.status)).toEqual([200, 200, 200, 200, 200]);
    } finally {
      app.server.close();
    }
  });

  it('frees the place of a client that gave up while waiting', async () => {
    const app = await slowApp(1);
    try {
      const first = fetch(`${app.base}/api/slow`);
      await settle();
      const quitter = new AbortController();
      const gaveUp = fetch(`${app.base}/api/slow`, { signal: quitter.signal }).catch(() => 'aborted');
      await settle();
      quitter.abort();
      expect(await gaveUp).toBe('aborted');
      await settle();
      app.gates.splice(0).forEach((open) => open());
      expect((await first).status).toBe(200);
      // The next reader is served, not stuck behind the one that left.
      const next = fetch(`${app.base}/api/slow`);
      await settle();
      expect(app.working()).toBe(1);
      app.gates.splice(0).forEach((open) => open());
      expect((await next).status).toBe(200);
    } finally {
      app.server.close();
    }
  });
});
