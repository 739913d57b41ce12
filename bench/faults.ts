/**
 * Fault suite (a script, not a timed test): 20 devices sync overlapping outboxes (two devices
 * per interviewer share ids) in batches of up to 1,000 while the API is killed with SIGKILL in
 * the middle of batches and restarted, and PostgreSQL is stopped and started during a batch.
 * Afterwards it checks that every interview is stored exactly once and that the quota board,
 * the balance and a direct count(*) agree, and reports sent / stored / duplicated / lost.
 *
 *   npm run test:faults
 *
 * It builds the API when stale and runs the built API (api/dist/main.js) on its own port and
 * database (plumbline_faults, recreated each run). It stops and restarts this checkout's
 * PostgreSQL cluster, so do not run it beside a demo you are using. Exits 1 on any finding.
 */
import knex from 'knex';
import { seeded } from '../api/src/demo/vellmoor.js';
import { migrateLatest } from '../scripts/migrate.js';
import { Device, Ledger, type Interview } from './faults/device.js';
import { injectFaults, type Fault } from './faults/inject.js';
import { ApiProcess, lib, startDatabase } from './faults/processes.js';
import { reconcile } from './faults/reconcile.js';
import { interviewMaker, PASSWORD, seedFieldwork, shuffled, targetsBody } from './faults/setup.js';

const PORT = Number(process.env.FAULTS_PORT ?? 3932);
const INTERVIEWERS = 10; // two devices each
const PER_DEVICE = 2500;
const SHARED = 1000; // ids both devices of an interviewer carry
const PLAN: Fault[] = [
  'kill the API (SIGKILL), restart it',
  'stop PostgreSQL, start it again',
  'kill the API (SIGKILL), restart it',
  'kill the API (SIGKILL), restart it',
  'stop PostgreSQL, start it again',
  'kill the API (SIGKILL), restart it',
];

async function main(): Promise<void> {
  await lib('ensure_node_modules && build_api');
  const url = await lib('ensure_postgres_running >/dev/null && ensure_database plumbline_faults --fresh && database_url plumbline_faults');
  await migrateLatest(url);
  const db = knex({ client: 'pg', connection: url, pool: { min: 0, max: 2 } });
  const api = new ApiProcess(PORT, url);
  try {
    const field = await seedFieldwork(db, INTERVIEWERS);
    await api.start();
    const lead = await login(api.base, field.lead);
    const targets = await call(api.base, `/api/projects/${field.projectId}/targets`, lead, 'PUT', targetsBody);

    const ledger = new Ledger();
    const random = seeded(7);
    const make = interviewMaker(targets, 11);
    const sent = new Map<string, Interview>();
    const devices: Device[] = [];
    for (const email of field.interviewers) {
      const pool = Array.from({ length: 2 * PER_DEVICE - SHARED }, make);
      for (const interview of pool) sent.set(interview.id, interview);
      for (const part of [pool.slice(0, PER_DEVICE), pool.slice(PER_DEVICE - SHARED)]) {
        devices.push(new Device(api.base, email, PASSWORD, field.projectId, shuffled(part, random), ledger));
      }
    }

    const started = Date.now();
    let finished = false;
    const syncing = Promise.all(devices.map((d) => d.run(started + 10 * 60_000))).finally(() => (finished = true));
    const struck = await injectFaults(PLAN, sent.size, ledger, api, () => finished);
    await syncing;
    const seconds = (Date.now() - started) / 1000;

    const supervisor = await login(api.base, field.supervisor);
    const board = await call(api.base, `/api/projects/${field.projectId}/quota-board`, supervisor);
    const balance = await call(api.base, `/api/projects/${field.projectId}/balance`, lead);
    const report = await reconcile({ db, projectId: field.projectId, sent, devices, ledger, board, balance });
    if (struck.length < PLAN.length) report.problems.push(`only ${struck.length} of ${PLAN.length} faults struck before the devices finished`);
    console.log(JSON.stringify({ devices: devices.length, batchSize: 1000, seconds: Number(seconds.toFixed(1)), requests: ledger.requests, failedRequests: ledger.failures, faults: struck, ...report }, null, 2));
    const r = report.summary;
    console.log(
      `\nsent ${r.sent} (${r.submissions} submissions) · stored ${r.stored} · duplicated ${r.duplicated} · lost ${r.lost} · ` +
        `completes: board ${r.boardCompletes}, balance ${r.balanceN}, count(*) ${r.countedCompletes} · ${report.problems.length ? 'FAILED' : 'OK'}`,
    );
    for (const problem of report.problems) console.log(`  problem: ${problem}`);
    process.exitCode = report.problems.length ? 1 : 0;
  } finally {
    await api.stop();
    await startDatabase();
    await db.destroy();
  }
}

async function call(base: string, path: string, token: string | null, method = 'GET', body?: unknown) {
  const res = await fetch(`${base}${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return res.json();
}

async function login(base: string, email: string): Promise<string> {
  return (await call(base, '/api/auth/login', null, 'POST', { email, password: PASSWORD })).accessToken;
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
