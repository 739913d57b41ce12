/**
 * Fieldwork benchmark (not a test): stores 10,000 interviews through the sync API in
 * batches of 1,000, then grows the project to 100,000 interviews and measures
 * GET /balance under 20 concurrent clients with autocannon, on loopback only.
 *
 *   npm run bench:fieldwork      (after `npm start` or `npm test` has built the API once)
 *
 * It uses its own database (plumbline_bench), recreated on every run.
 */
import autocannon from 'autocannon';
import { execFileSync, spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { join, resolve } from 'node:path';
import knex from 'knex';
import { hashPassword } from '../api/src/auth/password.js';
import { drawRespondent, seeded, VELLMOOR_TARGETS } from '../api/src/demo/vellmoor.js';
import { migrateLatest } from '../scripts/migrate.js';

const root = resolve(import.meta.dirname, '..');
const PORT = 3931;
const BASE = `http://127.0.0.1:${PORT}`;
const PASSWORD = 'bench password 1';

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

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] as number;
}

async function main(): Promise<void> {
  const url = databaseUrl();
  await migrateLatest(url);
  const db = knex({ client: 'pg', connection: url });
  const hash = await hashPassword(PASSWORD);
  const [org] = await db('organisations').insert({ name: 'Bench agency' }).returning('*');
  const [lead, interviewer] = await db('users')
    .insert([
      { organisation_id: org.id, email: 'lead@bench.example', name: 'Lead', role: 'lead', password_hash: hash },
      { organisation_id: org.id, email: 'int@bench.example', name: 'Interviewer', role: 'interviewer', password_hash: hash },
    ])
    .returning('*');
  const [project] = await db('projects')
    .insert({ organisation_id: org.id, name: 'Bench', target_size: 100_000, headline_question: 'Support?', status: 'fieldwork' })
    .returning('*');
  await db('project_members').insert({ project_id: project.id, user_id: interviewer.id });

  const server = spawn(process.execPath, [join(root, 'api/dist/main.js')], {
    env: { ...process.env, DATABASE_URL: url, PORT: String(PORT), HOST: '127.0.0.1', JWT_SECRET: 'bench-secret-0123456789abcdefghijklmnop', LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  try {
    for (let i = 0; i < 100; i++) {
      if (await fetch(`${BASE}/api/health`).then((r) => r.ok, () => false)) break;
      await new Promise((r) => setTimeout(r, 200));
    }
    const leadToken = (await api('/api/auth/login', null, 'POST', { email: lead.email, password: PASSWORD })).accessToken;
    const intToken = (await api('/api/auth/login', null, 'POST', { email: interviewer.email, password: PASSWORD })).accessToken;
    const targets = await api(`/api/projects/${project.id}/targets`, leadToken, 'PUT', {
      variables: Object.entries(VELLMOOR_TARGETS).map(([name, shares]) => ({
        name,
        interlocked: name === 'age_band' || name === 'sex',
        categories: Object.entries(shares).map(([label, share]) => ({ label, share })),
      })),
    });
    const random = seeded(42);
    const interview = () => {
      const r = drawRespondent(random);
      const categories: Record<string, string> = {};
      for (const v of targets.variables as { id: string; name: string; categories: { id: string; label: string }[] }[]) {
        categories[v.id] = v.categories.find((c) => c.label === r.categories[v.name])!.id;
      }
      return { id: randomUUID(), disposition: 'complete', categories, headlineAnswer: r.supports, startedAt: '2026-11-20T10:00:00Z', endedAt: '2026-11-20T10:15:00Z' };
    };

    // 1. Sync: 10 batches of 1,000.
    const batches = Array.from({ length: 10 }, () => Array.from({ length: 1000 }, interview));
    const t0 = performance.now();
    for (const batch of batches) {
      const reply = await api(`/api/projects/${project.id}/interviews/sync`, intToken, 'POST', { interviews: batch });
      if (reply.accepted !== 1000) throw new Error(`only ${reply.accepted} accepted`);
    }
    const syncSeconds = (performance.now() - t0) / 1000;

    // 2. Grow to 100,000 interviews directly in the database, then load GET /balance.
    const categoryIds = (i: ReturnType<typeof interview>) => Object.values(i.categories);
    for (let n = 10_000; n < 100_000; n += 5000) {
      await db('interviews').insert(
        Array.from({ length: 5000 }, () => {
          const i = interview();
          return {
            id: i.id, project_id: project.id, interviewer_id: interviewer.id, disposition: 'complete', category_ids: categoryIds(i),
            headline_answer: i.headlineAnswer, started_at: i.startedAt, ended_at: i.endedAt, field_day: '2026-11-20',
          };
        }),
      );
    }
    await db.raw('ANALYZE interviews');
    const latencies: number[] = [];
    const result = await new Promise<autocannon.Result>((done, fail) => {
      const instance = autocannon(
        { url: `${BASE}/api/projects/${project.id}/balance`, connections: 20, duration: 15, headers: { Authorization: `Bearer ${leadToken}` } },
        (error, r) => (error ? fail(error) : done(r)),
      );
      instance.on('response', (_client, status, _bytes, ms) => {
        if (status !== 200) fail(new Error(`balance answered ${status}`));
        latencies.push(ms);
      });
    });
    latencies.sort((a, b) => a - b);
    const figures = {
      sync: { interviews: 10_000, batchSize: 1000, seconds: Number(syncSeconds.toFixed(2)), interviewsPerSecond: Math.round(10_000 / syncSeconds) },
      balance: {
        interviews: 100_000,
        connections: 20,
        requests: result.requests.total,
        requestsPerSecond: result.requests.average,
        p50ms: percentile(latencies, 50),
        p95ms: percentile(latencies, 95),
        p99ms: percentile(latencies, 99),
        errors: result.errors + result.non2xx,
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
