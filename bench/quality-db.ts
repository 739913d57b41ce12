/**
 * `npm run bench:quality-db`: the whole quality recompute of a 100,000-interview project,
 * database included: read the interviews and the interviewer × cell counts, run the timing
 * rules and the interviewers' answer tests, and replace the findings and tests in one
 * transaction (api/src/quality/quality-check.ts, as the job runs it). The interviews are
 * inserted directly (120 interviewers working one contact after another over 28 days, a
 * quarter of them completes, a few too short). Reports the first run and the median of 5.
 * Uses its own database (plumbline_bench_quality), recreated on every run.
 */
import { execFileSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { resolve } from 'node:path';
import knex from 'knex';
import type { Disposition, InterviewRow } from '../api/src/database/tables.js';
import { draw, drawRespondent, seeded, VELLMOOR_TARGETS } from '../api/src/demo/vellmoor.js';
import { runQualityCheck } from '../api/src/quality/quality-check.js';
import { migrateLatest } from '../scripts/migrate.js';
import { CONTACT_MIX } from './generate-data.js';

const N = Number(process.env.BENCH_ROWS ?? 100_000);
const INTERVIEWERS = 120;
const DAYS = 28;
const root = resolve(import.meta.dirname, '..');
const url = execFileSync('bash', ['-c', 'source scripts/lib.sh && ensure_postgres_running >/dev/null && ensure_database plumbline_bench_quality --fresh && database_url plumbline_bench_quality'], { cwd: root, encoding: 'utf8' })
  .trim().split('\n').at(-1) as string;

await migrateLatest(url);
const db = knex({ client: 'pg', connection: url });
try {
  const [org] = await db('organisations').insert({ name: 'Bench agency' }).returning('id');
  const team = await db('users')
    .insert(Array.from({ length: INTERVIEWERS }, (_, i) => ({ organisation_id: org!.id, email: `int${i}@bench.example`, name: `Interviewer ${i}`, role: 'interviewer', password_hash: 'x' })))
    .returning('id');
  const [project] = await db('projects')
    .insert({ organisation_id: org!.id, name: 'Bench', target_size: N, headline_question: 'Support?', status: 'fieldwork', time_zone: 'Europe/London' })
    .returning('id');
  const projectId = project!.id as string;
  // The rules only group completes by their category ids, so made-up ids stand in for targets.
  const ids = new Map(Object.entries(VELLMOOR_TARGETS).flatMap(([v, shares]) => Object.keys(shares).map((c) => [`${v}:${c}`, randomUUID()] as const)));
  const categoryId = (variable: string, label: string) => ids.get(`${variable}:${label}`)!;

  // Each interviewer works a day from about 09:00, one contact after another.
  const random = seeded(11);
  const perDay = Math.ceil(N / INTERVIEWERS / DAYS);
  const rows: Partial<InterviewRow>[] = [];
  const clocks: number[] = [];
  const t0 = Date.UTC(2026, 10, 2);
  for (let k = 0; k < N; k++) {
    const who = k % INTERVIEWERS;
    const nth = Math.floor(k / INTERVIEWERS);
    const day = Math.floor(nth / perDay) % DAYS;
    if (nth % perDay === 0) clocks[who] = t0 + day * 86_400_000 + (8.5 + random()) * 3_600_000;
    const disposition = draw(random, CONTACT_MIX) as Disposition;
    const complete = disposition === 'complete';
    const minutes = complete ? (random() < 0.02 ? 3 : 12 + random() * 18) : 1 + random() * 3;
    const startedAt = clocks[who]!;
    const endedAt = startedAt + minutes * 60_000;
    clocks[who] = endedAt + (2 + random() * 8) * 60_000;
    const r = drawRespondent(random);
    rows.push({
      id: randomUUID(), project_id: projectId, interviewer_id: team[who]!.id, disposition,
      category_ids: complete ? Object.entries(r.categories).map(([v, label]) => categoryId(v, label)).sort() : [],
      headline_answer: complete ? ((r.supports ? 'yes' : 'no') as 'yes' | 'no') : null,
      started_at: new Date(startedAt), ended_at: new Date(endedAt), field_day: new Date(endedAt).toISOString().slice(0, 10),
    });
  }
  for (let k = 0; k < rows.length; k += 5000) await db('interviews').insert(rows.slice(k, k + 5000));

  const times: number[] = [];
  let last = null;
  for (let run = 0; run < 5; run++) {
    const start = performance.now();
    last = await runQualityCheck(db, projectId);
    times.push(performance.now() - start);
  }
  const first = times[0]!;
  const median = [...times].sort((a, b) => a - b)[2]!;
  console.log(`${N.toLocaleString('en-GB')} interviews, ${INTERVIEWERS} interviewers: recompute with the database ${(first / 1000).toFixed(2)} s first run, ${(median / 1000).toFixed(2)} s median of 5; ${last!.findings} findings, ${last!.interviewersTested} interviewers tested, ${last!.interviewersFlagged} flagged (load average ${loadavg()[0]!.toFixed(1)})`);
  // The worst case for the writes: working hours that flag every interview out of hours.
  await db('projects').where({ id: projectId }).update({ quality_settings: { outOfHours: { from: '20:00', to: '21:00' } } });
  const start = performance.now();
  const all = await runQualityCheck(db, projectId);
  console.log(`with every interview flagged out of hours: ${((performance.now() - start) / 1000).toFixed(2)} s, ${all.findings} findings replaced`);
} finally {
  await db.destroy();
}
