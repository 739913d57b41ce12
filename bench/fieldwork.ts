/**
 * Fieldwork benchmark (not a test), on loopback only:
 *  1. stores 10,000 interviews through the sync API in batches of 1,000, one after another;
 *  2. grows the project to 100,000 interviews and loads GET /balance with 20 clients;
 *  3. grows it to 400,000 contacts of every outcome (40 interviewers, 30 field days) and
 *     loads GET /quota-board with 20 clients;
 *  4. measures sync throughput (4 devices sending batches of 100) alone, then again while
 *     20 clients request the quota board back to back, and for scale while 20 clients
 *     request the lightest signed-in read (GET /projects/:id) back to back.
 *
 *   npm run bench:fieldwork      (after `npm start` or `npm test` has built the API once)
 *
 * It uses its own database (plumbline_bench), recreated on every run.
 */
import { execFileSync, spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { cpus, loadavg } from 'node:os';
import { join, resolve } from 'node:path';
import knex from 'knex';
import { hashPassword } from '../api/src/auth/password.js';
import { drawRespondent, seeded, VELLMOOR_TARGETS } from '../api/src/demo/vellmoor.js';
import { migrateLatest } from '../scripts/migrate.js';
import { contactRows } from './generate-data.js';
import { load } from './load.js';

/** The benchmark sends no mail; the setting is required, nothing listens there. */
const NO_MAIL = 'smtp://127.0.0.1:1025';

const root = resolve(import.meta.dirname, '..');
const PORT = Number(process.env.BENCH_API_PORT ?? 3931);
const BASE = `http://127.0.0.1:${PORT}`;
const PASSWORD = 'bench password 1';
const INTERVIEWERS = 40;
const FIELD_DAYS = 30;
const SECONDS = 15;

function databaseUrl(): string {
  return execFileSync('bash', ['-c', 'source scripts/lib.sh && ensure_postgres_running >/dev/null && ensure_database plumbline_bench --fresh && database_url plumbline_bench'], {
    cwd: root,
    encoding: 'utf8',
  }).trim().split('\n').at(-1) as string;
}

async function api(path: string, token: string | null, method = 'GET', body?: unknown) {
  const res = await fetch(`${BASE}${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return res.json();
}

/** Access tokens last 15 minutes and the run takes longer: sign in afresh before each phase. */
const signIn = async (email: string): Promise<string> => (await api('/api/auth/login', null, 'POST', { email, password: PASSWORD })).accessToken;

const log = (message: string) => console.error(`[bench] ${new Date().toISOString().slice(11, 19)} ${message}`);

async function main(): Promise<void> {
  const loadAtStart = loadavg().map((x) => Number(x.toFixed(2)));
  const url = databaseUrl();
  await migrateLatest(url);
  const db = knex({ client: 'pg', connection: url });
  const hash = await hashPassword(PASSWORD);
  const [org] = await db('organisations').insert({ name: 'Bench agency' }).returning('*');
  const [lead, interviewer, ...team] = await db('users')
    .insert([
      { organisation_id: org!.id, email: 'lead@bench.example', name: 'Lead', role: 'lead', password_hash: hash },
      ...Array.from({ length: INTERVIEWERS }, (_, i) => ({
        organisation_id: org!.id, email: `int${i}@bench.example`, name: `Interviewer ${String(i).padStart(2, '0')}`, role: 'interviewer' as const, password_hash: hash,
      })),
    ])
    .returning('*');
  const [project] = await db('projects')
    .insert({ organisation_id: org!.id, name: 'Bench', target_size: 100_000, headline_question: 'Support?', status: 'fieldwork' })
    .returning('*');
  await db('project_members').insert([interviewer!, ...team].map((u) => ({ project_id: project!.id, user_id: u.id })));

  const server = spawn(process.execPath, [join(root, 'api/dist/main.js')], {
    env: { ...process.env, DATABASE_URL: url, PORT: String(PORT), HOST: '127.0.0.1', JWT_SECRET: 'bench-secret-0123456789abcdefghijklmnop', LOG_LEVEL: 'warn', SMTP_URL: NO_MAIL },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  try {
    for (let i = 0; i < 100; i++) {
      if (await fetch(`${BASE}/api/health`).then((r) => r.ok, () => false)) break;
      await new Promise((r) => setTimeout(r, 200));
    }
    const targets = await api(`/api/projects/${project!.id}/targets`, await signIn(lead!.email), 'PUT', {
      variables: Object.entries(VELLMOOR_TARGETS).map(([name, shares]) => ({
        name,
        interlocked: name === 'age_band' || name === 'sex',
        categories: Object.entries(shares).map(([label, share]) => ({ label, share })),
      })),
    });
    const variables = targets.variables as { id: string; name: string; categories: { id: string; label: string }[] }[];
    const categoryId = (variable: string, label: string) => variables.find((v) => v.name === variable)!.categories.find((c) => c.label === label)!.id;
    const random = seeded(42);
    const interview = (endedAt = '2026-11-20T10:15:00Z') => {
      const r = drawRespondent(random);
      const categories = Object.fromEntries(variables.map((v) => [v.id, categoryId(v.name, r.categories[v.name] as string)]));
      const startedAt = new Date(Date.parse(endedAt) - 15 * 60_000).toISOString();
      return { id: randomUUID(), disposition: 'complete', categories, headlineAnswer: (r.supports ? 'yes' : 'no') as 'yes' | 'no', startedAt, endedAt };
    };
    const paths = { sync: `/api/projects/${project!.id}/interviews/sync`, balance: `/api/projects/${project!.id}/balance`, board: `/api/projects/${project!.id}/quota-board`, project: `/api/projects/${project!.id}` };

    // 1. Sync: 10 batches of 1,000, one after another.
    log('sync of 10,000 interviews');
    const intToken = await signIn(interviewer!.email);
    const batches = Array.from({ length: 10 }, () => Array.from({ length: 1000 }, () => interview()));
    const t0 = performance.now();
    for (const batch of batches) {
      const reply = await api(paths.sync, intToken, 'POST', { interviews: batch });
      if (reply.accepted !== 1000) throw new Error(`only ${reply.accepted} accepted`);
    }
    const syncSeconds = (performance.now() - t0) / 1000;

    // 2. Grow to 100,000 interviews directly in the database, then load GET /balance.
    log('growing to 100,000 interviews');
    for (let n = 10_000; n < 100_000; n += 5000) {
      await db('interviews').insert(
        Array.from({ length: 5000 }, () => {
          const i = interview();
          return {
            id: i.id, project_id: project!.id, interviewer_id: interviewer!.id, disposition: 'complete' as const, category_ids: Object.values(i.categories),
            headline_answer: i.headlineAnswer, started_at: new Date(i.startedAt), ended_at: new Date(i.endedAt), field_day: '2026-11-20',
          };
        }),
      );
    }
    await db.raw('ANALYZE interviews');
    log('GET /balance, 20 clients');
    const balance = await load({ url: `${BASE}${paths.balance}`, token: await signIn(lead!.email), connections: 20, seconds: SECONDS });

    // 3. Grow to 400,000 contacts of every outcome by the whole team over 30 field days.
    log('growing to 400,000 contacts');
    const today = Date.now();
    const days = Array.from({ length: FIELD_DAYS }, (_, i) => new Date(today - i * 86_400_000).toISOString().slice(0, 10));
    const plan = { projectId: project!.id, interviewerIds: [interviewer!, ...team].map((u) => u.id), days, categoryId };
    for (let n = 100_000; n < 400_000; n += 5000) await db('interviews').insert(contactRows(5000, random, plan));
    await db.raw('ANALYZE');
    const contacts = Number((await db('interviews').where({ project_id: project!.id }).count({ n: '*' }))[0]!.n);
    log(`GET /quota-board at ${contacts} contacts, 20 clients`);
    const leadToken = await signIn(lead!.email);
    const board = await load({ url: `${BASE}${paths.board}`, token: leadToken, connections: 20, seconds: SECONDS });

    // 4. Sync throughput alone, then with 20 clients on the quota board at the same time.
    const device = { url: `${BASE}${paths.sync}`, method: 'POST' as const, token: await signIn(interviewer!.email), connections: 4, seconds: SECONDS };
    const syncBody = () => ({ interviews: Array.from({ length: 100 }, () => interview(new Date().toISOString())) });
    log('sync alone: 4 devices, batches of 100');
    const syncAlone = await load({ ...device, body: syncBody });
    log('sync while 20 clients load the quota board');
    const [syncUnderLoad, boardUnderLoad] = await Promise.all([
      load({ ...device, token: await signIn(interviewer!.email), body: syncBody }),
      load({ url: `${BASE}${paths.board}`, token: await signIn(lead!.email), connections: 20, seconds: SECONDS }),
    ]);
    // For scale: the same with 20 clients on the lightest signed-in read (one project's summary).
    log('sync while 20 clients read GET /projects/:id');
    const [syncUnderLightLoad] = await Promise.all([
      load({ ...device, token: await signIn(interviewer!.email), body: syncBody }),
      load({ url: `${BASE}${paths.project}`, token: await signIn(lead!.email), connections: 20, seconds: SECONDS }),
    ]);

    const figures = {
      // Other work on the machine slows every figure: the load averages say how busy it was.
      machine: { cpus: cpus().length, loadAverageAtStart: loadAtStart, loadAverageAtEnd: loadavg().map((x) => Number(x.toFixed(2))) },
      sync: { interviews: 10_000, batchSize: 1000, seconds: Number(syncSeconds.toFixed(2)), interviewsPerSecond: Math.round(10_000 / syncSeconds) },
      balance: { interviews: 100_000, ...balance },
      quotaBoard: { contacts, interviewers: INTERVIEWERS, fieldDays: FIELD_DAYS, ...board },
      syncThroughput: {
        batchSize: 100,
        alone: syncAlone,
        withBoardLoad: syncUnderLoad,
        ratio: Number((syncUnderLoad.requestsPerSecond / syncAlone.requestsPerSecond).toFixed(2)),
        boardMeanwhile: boardUnderLoad,
        withProjectReadLoad: syncUnderLightLoad,
        ratioProjectRead: Number((syncUnderLightLoad.requestsPerSecond / syncAlone.requestsPerSecond).toFixed(2)),
      },
    };
    console.log(JSON.stringify(figures, null, 2));
  } finally {
    await new Promise((r) => setTimeout(r, 1000)); // let the last requests finish
    server.kill('SIGTERM');
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
