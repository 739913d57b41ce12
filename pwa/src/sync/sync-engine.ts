// The one bridge between the device's outbox (Dexie) and the server for interviews.
// It sends the signed-in interviewer's own waiting entries, oldest first, per project in
// batches of at most 1,000, and applies each reply in one transaction (db/sync-store):
// acknowledged entries leave the device, refused ones keep their reason, the returned cell
// counts become the cached cell status. Then it refreshes the cached projects and cells.
// It always tries the network (the browser's online flag is not trusted). Unreachable,
// signed out or with the connection dropped mid-batch it stops and keeps everything: an entry is removed only after the server's reply names it. Other people's
// entries on the device are never read for sending. One run at a time; a request during a
// run queues exactly one more run.
import { readSession } from '../db/session-store';
import { listWaiting } from '../db/outbox-store';
import { readProjects, saveCells, saveProjects, setLastSync } from '../db/cache-store';
import { settleBatch } from '../db/sync-store';
import type { OutboxEntry } from '../db/plumbline-db';
import { isApiError } from '../lib/api-error';
import { getAssignedProjects } from './api/get-assigned-projects';
import { getProjectCells } from './api/get-project-cells';
import { postInterviewBatch, SYNC_BATCH_LIMIT, type SyncReply } from './api/post-interview-batch';
import { reportProgress } from './sync-progress';

export type SyncOutcome = 'done' | 'skipped' | 'offline' | 'signed-out' | 'incomplete';

let running: Promise<SyncOutcome> | null = null;
let again = false;
/** A correction of the outbox in progress (whileSyncIdle): no sync starts until it is done. */
let paused: Promise<unknown> | null = null;

/**
 * Runs a change to waiting outbox entries while no batch is in flight, and holds off any sync
 * until it is done: an entry edited or voided on the device is never the one a batch already
 * carries to the server with its old content.
 */
export async function whileSyncIdle<T>(change: () => Promise<T>): Promise<T> {
  while (running || paused) await (running ?? paused);
  const work = change();
  paused = work.catch(() => undefined);
  try {
    return await work;
  } finally {
    paused = null;
  }
}

/** Starts a sync, or, if one is running, makes sure another follows it. */
export function requestSync(): Promise<SyncOutcome> {
  if (running) {
    again = true;
    return running;
  }
  running = (async () => {
    let outcome: SyncOutcome;
    do {
      again = false;
      while (paused) await paused;
      outcome = await syncOnce();
    } while (again && outcome === 'done');
    return outcome;
  })().finally(() => {
    running = null;
  });
  return running;
}

/** Resolves when no sync is running (tests wait on it). */
export async function whenSyncIdle(): Promise<void> {
  while (running) await running.catch(() => undefined);
}

class Stop extends Error {
  constructor(readonly outcome: SyncOutcome, message: string) {
    super(message);
  }
}

async function syncOnce(): Promise<SyncOutcome> {
  const session = await readSession();
  if (!session || session.user.role !== 'interviewer') return 'skipped';
  const userId = session.user.id;

  const waiting = await listWaiting(userId);
  reportProgress({ running: true, sent: 0, total: waiting.length, problems: [] });
  const problems: string[] = [];
  try {
    const names = new Map((await readProjects(userId)).map((p) => [p.id, p.name]));
    let sent = 0;
    for (const [projectId, entries] of byProject(waiting)) {
      for (let start = 0; start < entries.length; start += SYNC_BATCH_LIMIT) {
        const batch = entries.slice(start, start + SYNC_BATCH_LIMIT);
        const reply = await sendBatch(userId, projectId, batch, names.get(projectId), problems);
        if (!reply) break; // this project refused the batch; its entries stay, try the next project
        sent += batch.length;
        reportProgress({ sent });
      }
    }
    await refreshCaches(userId);
    if (problems.length === 0) await setLastSync(userId, new Date().toISOString());
    reportProgress({ running: false, problems });
    return problems.length ? 'incomplete' : 'done';
  } catch (error) {
    if (error instanceof Stop) {
      // Out of reach is not a problem to list: the connection strip says so, and the scheduler retries.
      reportProgress({ running: false, problems: error.outcome === 'offline' ? problems : [...problems, error.message] });
      return error.outcome;
    }
    reportProgress({ running: false, problems: [...problems, 'Sync stopped unexpectedly. Everything unsent is still on this device.'] });
    return 'incomplete';
  }
}

/** Groups entries by project, keeping the oldest-first order within and between projects. */
function byProject(entries: OutboxEntry[]): Map<string, OutboxEntry[]> {
  const groups = new Map<string, OutboxEntry[]>();
  for (const entry of entries) {
    const group = groups.get(entry.projectId);
    if (group) group.push(entry);
    else groups.set(entry.projectId, [entry]);
  }
  return groups;
}

async function sendBatch(
  userId: string,
  projectId: string,
  batch: OutboxEntry[],
  projectName: string | undefined,
  problems: string[],
): Promise<SyncReply | null> {
  // The person on the device may have changed since the run began: never send under someone else's sign-in.
  const session = await readSession();
  if (session?.user.id !== userId) throw new Stop('signed-out', 'Signed out during sync. Everything unsent is still on this device.');
  let reply: SyncReply;
  try {
    reply = await postInterviewBatch(projectId, batch.map((entry) => entry.payload));
  } catch (error) {
    if (isApiError(error) && error.kind === 'offline') {
      throw new Stop('offline', 'The office could not be reached. Nothing was lost; the rest goes when the network is back.');
    }
    if (isApiError(error) && error.kind === 'signed-out') {
      throw new Stop('signed-out', 'Your sign-in has ended. Unsent interviews stay on this device until you sign in again.');
    }
    const message = isApiError(error) ? error.message : 'The server could not be reached.';
    problems.push(`${projectName ?? 'A project'}: ${message}`);
    return null;
  }
  const acknowledged: string[] = [];
  const rejected: { clientId: string; reason: string }[] = [];
  const byId = new Map(reply.results.map((r) => [r.id, r]));
  batch.forEach((entry, index) => {
    // The server answers in the order sent; the id look-up guards against a reply out of step.
    const result = byId.get(entry.clientId) ?? reply.results[index];
    if (!result) return; // not answered: keep it for the next run
    if (result.status === 'rejected') rejected.push({ clientId: entry.clientId, reason: result.reason ?? 'refused by the server' });
    else acknowledged.push(entry.clientId);
  });
  await settleBatch({ projectId, acknowledged, rejected, cells: reply.cells, syncedAt: new Date().toISOString() });
  return reply;
}

/** Fresh projects and cell counts for offline use; offline or signed out, the old copies stay. */
async function refreshCaches(userId: string): Promise<void> {
  try {
    const projects = await getAssignedProjects();
    if ((await readSession())?.user.id !== userId) throw new Stop('signed-out', 'Signed out during sync.');
    await saveProjects(userId, projects);
    for (const project of projects) {
      const cells = await getProjectCells(project.id);
      // When this device heard, not the server's clock in the body: after a 304 the browser hands back the stored body.
      await saveCells(project.id, cells.cells, new Date().toISOString(), cells.variables);
    }
  } catch (error) {
    if (error instanceof Stop) throw error;
    if (isApiError(error) && error.kind === 'offline') {
      throw new Stop('offline', 'The office could not be reached. Nothing was lost; the rest goes when the network is back.');
    }
    if (isApiError(error) && error.kind === 'signed-out') {
      throw new Stop('signed-out', 'Your sign-in has ended. Unsent interviews stay on this device until you sign in again.');
    }
    throw new Stop('incomplete', `Could not refresh projects and cells: ${isApiError(error) ? error.message : 'unknown problem'}`);
  }
}
