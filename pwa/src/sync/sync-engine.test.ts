import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, type InterviewRecord } from '../db/plumbline-db';
import { installFakeApi, json, problem, type FakeApi } from '../test/fake-api';
import { completeEntry, syncedBefore, tramCells, tramProject, tramVariables } from '../test/field-fixtures';
import { signedInAs } from '../test/render-app';
import { requestSync, whenSyncIdle } from './sync-engine';
import { readProgress, resetProgress } from './sync-progress';
import { readReachability } from '../lib/reachability';
import { changeUnsentAnswer, voidUnsentContact } from './void-contact';

const me = 'user-interviewer';
const who = { 'v-age': 'c-old', 'v-region': 'c-quay' };
const freshCells = tramCells.map((c) => ({ ...c, achieved: c.achieved + 1 }));

interface Batch {
  interviews: InterviewRecord[];
}

let api: FakeApi;
let batches: string[][];

/** A server that accepts every interview unless `answer` says otherwise. */
function serve(answer: (id: string) => { status: string; reason?: string } = () => ({ status: 'accepted' })) {
  api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, ({ body }) => {
    const ids = (body as Batch).interviews.map((i) => i.id);
    batches.push(ids);
    return json({ results: ids.map((id) => ({ id, ...answer(id) })), accepted: 0, duplicates: 0, rejected: 0, cells: freshCells });
  });
}

beforeEach(async () => {
  await whenSyncIdle();
  resetProgress();
  api = installFakeApi();
  batches = [];
  api.on('GET', '/api/projects', () => json([tramProject]));
  api.on('GET', `/api/projects/${tramProject.id}/cells`, () =>
    json({ variables: tramVariables, cells: freshCells, refreshedAt: '2026-11-21T10:00:00.000Z' }),
  );
  await signedInAs('interviewer');
});

afterEach(async () => {
  await whenSyncIdle();
});

describe('sync module', () => {
  it('sends the outbox oldest first in batches of at most 1,000 and empties it', async () => {
    serve();
    const entries = Array.from({ length: 1205 }, (_, i) => completeEntry(i + 1, me, who));
    await db.outbox.bulkAdd([...entries].reverse());

    expect(await requestSync()).toBe('done');

    expect(batches.map((b) => b.length)).toEqual([1000, 205]);
    expect(batches[0]![0]).toBe(entries[0]!.clientId);
    expect(batches[1]![204]).toBe(entries[1204]!.clientId);
    expect(await db.outbox.count()).toBe(0);
    expect((await db.cellCache.get(tramProject.id))?.cells).toEqual(freshCells);
    expect((await db.meta.get(`lastSync:${me}`))?.value).toEqual(expect.any(String));
  });

  it('removes accepted and already-known entries and keeps refused ones with the server’s reason', async () => {
    const [accepted, duplicate, refused] = [1, 2, 3].map((n) => completeEntry(n, me, who));
    serve((id) =>
      id === refused!.clientId
        ? { status: 'rejected', reason: 'region: unknown category c-quay' }
        : { status: id === duplicate!.clientId ? 'duplicate' : 'accepted' },
    );
    await db.outbox.bulkAdd([accepted!, duplicate!, refused!]);

    expect(await requestSync()).toBe('done');

    const left = await db.outbox.toArray();
    expect(left.map((e) => e.clientId)).toEqual([refused!.clientId]);
    expect(left[0]!.rejectedReason).toBe('region: unknown category c-quay');

    // A refused entry is not sent again.
    batches = [];
    await requestSync();
    expect(batches).toEqual([]);
    expect(await db.outbox.count()).toBe(1);
  });

  it('keeps everything when the connection drops during a batch, and marks the office out of reach', async () => {
    await syncedBefore(me);
    api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, () => {
      throw new TypeError('Failed to fetch');
    });
    await db.outbox.bulkAdd([completeEntry(1, me, who), completeEntry(2, me, who)]);

    expect(await requestSync()).toBe('offline');

    expect(await db.outbox.count()).toBe(2);
    expect((await db.outbox.toArray()).every((e) => e.rejectedReason === undefined)).toBe(true);
    expect(await db.meta.get(`lastSync:${me}`)).toBeUndefined();
    expect(readReachability().reach).toBe('unreachable');
    expect(readProgress().problems).toEqual([]);
  });

  it('keeps the outbox and the sign-in while the office answers 503, and says why', async () => {
    api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, () =>
      problem(503, 'Service Unavailable', 'The database is not reachable right now.'),
    );
    await db.outbox.add(completeEntry(1, me, who));

    expect(await requestSync()).toBe('incomplete');

    expect(await db.outbox.count()).toBe(1);
    expect(await db.session.count()).toBe(1);
    expect(readProgress().problems).toEqual(['A project: The database is not reachable right now.']);
  });

  it('keeps everything when the server fails, and says so without recording a successful sync', async () => {
    api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, () => problem(500, 'Internal Server Error', 'boom'));
    await db.outbox.add(completeEntry(1, me, who));

    expect(await requestSync()).toBe('incomplete');

    expect(await db.outbox.count()).toBe(1);
    expect(await db.meta.get(`lastSync:${me}`)).toBeUndefined();
    expect(readProgress().problems).toEqual(['A project: boom']);
  });

  it('keeps the outbox when the sign-in has expired and cannot be renewed', async () => {
    api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, () => problem(401, 'Unauthorized', 'token expired'));
    api.on('POST', '/api/auth/refresh', () => problem(401, 'Unauthorized', 'refresh token expired'));
    await db.outbox.add(completeEntry(1, me, who));

    expect(await requestSync()).toBe('signed-out');

    expect(await db.session.count()).toBe(0);
    expect(await db.outbox.count()).toBe(1);
    expect(readProgress().problems.join(' ')).toMatch(/stay on this device until you sign in again/);
  });

  it('sends only the signed-in interviewer’s entries and leaves another person’s untouched', async () => {
    serve();
    const mine = completeEntry(1, me, who);
    const theirs = completeEntry(2, 'user-someone-else', who);
    await db.outbox.bulkAdd([mine, theirs]);

    await requestSync();

    expect(batches).toEqual([[mine.clientId]]);
    expect(await db.outbox.toArray()).toEqual([theirs]);
  });

  it('never runs twice at once: a request during a run sends nothing twice', async () => {
    serve();
    await db.outbox.bulkAdd([completeEntry(1, me, who), completeEntry(2, me, who)]);

    await Promise.all([requestSync(), requestSync(), requestSync()]);

    expect(batches.flat()).toHaveLength(2);
    expect(await db.outbox.count()).toBe(0);
  });

  it('sends nothing while the network is cut, even when the browser claims to be online, and keeps the outbox', async () => {
    serve();
    api.setNetwork('down');
    await db.outbox.add(completeEntry(1, me, who));

    expect(navigator.onLine).toBe(true);
    expect(await requestSync()).toBe('offline');
    expect(api.calls).toEqual([]);
    expect(await db.outbox.count()).toBe(1);
    expect(readReachability().reach).toBe('unreachable');
  });

  it('still tries when the browser claims to be offline: the flag is only a hint', async () => {
    serve();
    Object.defineProperty(navigator, 'onLine', { configurable: true, get: () => false });
    try {
      await db.outbox.add(completeEntry(1, me, who));
      expect(await requestSync()).toBe('done');
      expect(await db.outbox.count()).toBe(0);
      expect(readReachability().reach).toBe('reachable');
    } finally {
      Object.defineProperty(navigator, 'onLine', { configurable: true, get: () => true });
    }
  });
});

describe('corrections while a batch is in flight', () => {
  it('voids a waiting contact only after the batch carrying it is answered: then it is sent, not silently lost', async () => {
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, async ({ body }) => {
      const ids = (body as Batch).interviews.map((i) => i.id);
      batches.push(ids);
      await held;
      return json({ results: ids.map((id) => ({ id, status: 'accepted' })), cells: freshCells });
    });
    await syncedBefore(me);
    const entry = completeEntry(1, me, who);
    await db.outbox.add(entry);
    const sync = requestSync();
    try {
      await vi.waitFor(() => expect(batches).toHaveLength(1));
    } catch (error) {
      release();
      throw error;
    }
    let voided: boolean | undefined;
    const correction = voidUnsentContact(entry.clientId, me).then((v) => (voided = v));
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(voided).toBeUndefined(); // waits for the batch
    release();
    await sync;
    await correction;
    // The server has it, so it is no longer waiting: the void on the device does nothing, and it is listed as sent (to void with a reason).
    expect(voided).toBe(false);
    expect(await db.outbox.count()).toBe(0);
    expect((await db.sent.get(entry.clientId))?.record.id).toBe(entry.clientId);
  });

  it('changes a waiting answer when no batch is in flight, and the batch then carries the new answer', async () => {
    serve();
    await syncedBefore(me);
    const entry = completeEntry(1, me, who);
    await db.outbox.add(entry);
    const sent: unknown[] = [];
    api.on('POST', `/api/projects/${tramProject.id}/interviews/sync`, ({ body }) => {
      sent.push(...(body as Batch).interviews);
      return json({ results: (body as Batch).interviews.map((i) => ({ id: i.id, status: 'accepted' })), cells: freshCells });
    });
    expect(await changeUnsentAnswer(entry.clientId, me, 'no_answer')).toBe(true);
    await requestSync();
    expect(sent).toEqual([expect.objectContaining({ id: entry.clientId, headlineAnswer: 'no_answer' })]);
  });
});
