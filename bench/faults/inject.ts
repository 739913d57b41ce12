// The faults, spread over the run: each waits until a share of the interviews has been
// acknowledged, then a random 20–250 ms more, and strikes while sync batches are on the wire.
import type { Ledger } from './device.js';
import { startDatabase, stopDatabase, type ApiProcess } from './processes.js';

export type Fault = 'kill the API (SIGKILL), restart it' | 'stop PostgreSQL, start it again';

export interface Struck {
  fault: Fault;
  acknowledgedBefore: number;
  batchesOnWire: number;
  downMs: number;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export async function injectFaults(plan: Fault[], total: number, ledger: Ledger, api: ApiProcess, finished: () => boolean): Promise<Struck[]> {
  const struck: Struck[] = [];
  for (const [i, fault] of plan.entries()) {
    const threshold = (total * (i + 1)) / (plan.length + 2);
    while (!finished() && ledger.acknowledged() < threshold) await sleep(5);
    await sleep(20 + Math.random() * 230);
    while (!finished() && ledger.inFlight === 0) await sleep(1);
    if (finished()) break;
    const entry = { fault, acknowledgedBefore: ledger.acknowledged(), batchesOnWire: ledger.inFlight };
    const down = Date.now();
    if (fault === 'kill the API (SIGKILL), restart it') {
      await api.kill();
      await sleep(300);
      await api.start();
    } else {
      await stopDatabase();
      await sleep(2000);
      await startDatabase();
    }
    struck.push({ ...entry, downMs: Date.now() - down });
  }
  return struck;
}
