/**
 * Review queue benchmark (not a test), on loopback only: a project of 100,000 contacts by 40
 * interviewers over 30 field days, inserted directly, about one in twelve flagged (arrival flags,
 * findings of the rules, one interviewer's answer test, back-checks not confirmed); then 20
 * clients fetch the queue's first page back to back, unfiltered, filtered by one flag and by one
 * interviewer's day; and, for scale, the lightest signed-in read the same way.
 *
 *   npm run bench:review-queue    (after `npm start` or `npm test` has built the API once)
 *
 * It uses its own database (plumbline_bench_review), recreated on every run.
 */
import { execFileSync, spawn } from 'node:child_process';
import { cpus, loadavg } from 'node:os';
import { join, resolve } from 'node:path';
import knex from 'knex';
import { hashPassword } from '../api/src/auth/password.js';
import { seeded, VELLMOOR_TARGETS } from '../api/src/demo/vellmoor.js';
import type { BackcheckRow, InterviewFindingRow } from '../api/src/database/tables.js';
import { migrateLatest } from '../scripts/migrate.js';
import { contactRows } from './generate-data.js';
import { load } from './load.js';

const root = resolve(import.meta.dirname, '..');
const PORT = Number(process.env.BENCH_API_PORT ?? 3932);
const BASE = `http://127.0.0.1:${PORT}`;
const PASSWORD = 'bench password 1';
const CONTACTS = 100_000;
const SECONDS = 15;

const databaseUrl = () =>
  execFileSync('bash', ['-c', 'source scripts/lib.sh && ensure_postgres_running >/dev/null && ensure_database plumbline_bench_review --fresh && database_url plumbline_bench_review'], { cwd: root, encoding: 'utf8' })
    .trim().split('\n').at(-1) as string;

async function api(path: string, token: string | null, method = 'GET', body?: unknown) {
  const res = await fetch(`${BASE}${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return res.json();
}
const signIn = async (email: string): Promise<string> => (await api('/api/auth/login', null, 'POST', { email, password: PASSWORD })).accessToken;
const log = (message: string) => console.error(`[bench] ${new Date().toISOString().slice(11, 19)} ${message}`);

async function main(): Promise<void> {
  const loadAtStart = loadavg().map((x) => Number(x.toFixed(2)));
  const url = databaseUrl();
  await migrateLatest(url);
  const db = knex({ client: 'pg', connection: url });
  const hash = await hashPassword(PASSWORD);
  const [org] = await db('organisations').insert({ name: 'Bench agency' }).returning('*');
  const [lead, supervisor, ...team] = await db('users')
    .insert([
      { organisation_id: org!.id, email: 'lead@bench.example', name: 'Lead', role: 'lead', password_hash: hash },
      { organisation_id: org!.id, email: 'supervisor@bench.example', name: 'Supervisor', role: 'supervisor', password_hash: hash },
      ...Array.from({ length: 40 }, (_, i) => ({ organisation_id: org!.id, email: `int${i}@bench.example`, name: `Interviewer ${i}`, role: 'interviewer' as const, password_hash: hash })),
    ])
    .returning('*');
  const [project] = await db('projects').insert({ organisation_id: org!.id, name: 'Bench', target_size: 100_000, headline_question: 'Support?', status: 'fieldwork' }).returning('*');
  await db('project_members').insert(team.map((u) => ({ project_id: project!.id, user_id: u.id })));

  const server = spawn(process.execPath, [join(root, 'api/dist/main.js')], {
    env: { ...process.env, DATABASE_URL: url, PORT: String(PORT), HOST: '127.0.0.1', JWT_SECRET: 'bench-secret-0123456789abcdefghijklmnop', LOG_LEVEL: 'warn', SMTP_URL: 'smtp://127.0.0.1:1025' },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  try {
    for (let i = 0; i < 100 && !(await fetch(`${BASE}/api/health`).then((r) => r.ok, () => false)); i++) await new Promise((r) => setTimeout(r, 200));
    const targets = await api(`/api/projects/${project!.id}/targets`, await signIn(lead!.email), 'PUT', {
      variables: Object.entries(VELLMOOR_TARGETS).map(([name, shares]) => ({
        name, interlocked: name === 'age_band' || name === 'sex', categories: Object.entries(shares).map(([label, share]) => ({ label, share })),
      })),
    });
    const variables = targets.variables as { name: string; categories: { id: string; label: string }[] }[];
    const categoryId = (variable: string, label: string) => variables.find((v) => v.name === variable)!.categories.find((c) => c.label === label)!.id;

    log(`inserting ${CONTACTS.toLocaleString('en-GB')} contacts, some flagged`);
    const random = seeded(7);
    const days = Array.from({ length: 30 }, (_, i) => new Date(Date.UTC(2026, 10, 1 + i)).toISOString().slice(0, 10));
    const plan = { projectId: project!.id, interviewerIds: team.map((u) => u.id), days, categoryId };
    const findings: InterviewFindingRow[] = [];
    const notConfirmed: Omit<BackcheckRow, 'selected_at' | 'respondent_reference' | 'reference_deleted_at'>[] = [];
    for (let n = 0; n < CONTACTS; n += 5000) {
      const rows = contactRows(5000, random, plan).map((row) => {
        const hour = 8 + Math.floor(random() * 12);
        const started = new Date(`${row.field_day}T${String(hour).padStart(2, '0')}:${String(Math.floor(random() * 60)).padStart(2, '0')}:00Z`);
        return { ...row, started_at: started, ended_at: new Date(started.getTime() + 15 * 60_000), flags: random() < 0.02 ? ['outside_field_dates'] : [] };
      });
      await db('interviews').insert(rows);
      for (const row of rows) {
        if (row.disposition === 'complete' && random() < 0.1) findings.push({ interview_id: row.id, project_id: project!.id, rule: 'too_short', reason: 'Took 4 min; under a third of the median complete (15 min)', figures: { minutes: 4, medianMinutes: 15 } });
        else if (row.disposition === 'complete' && random() < 0.005) notConfirmed.push({ interview_id: row.id, project_id: project!.id, interviewer_id: row.interviewer_id, share_at_selection: 0.1, outcome: 'not_confirmed', outcome_note: 'Respondent was not at home that day', recorded_by: supervisor!.id, recorded_at: new Date() });
      }
    }
    for (let i = 0; i < findings.length; i += 5000) await db('interview_findings').insert(findings.slice(i, i + 5000));
    await db('backchecks').insert(notConfirmed);
    await db('interviewer_tests').insert({ project_id: project!.id, interviewer_id: team[0]!.id, completes: 600, p_value: 0.0004, adjusted_p_value: 0.016, flagged: true, reason: 'Answers yes more often than the others in the same cells', figures: {} });
    await db.raw('ANALYZE');

    const path = `/api/projects/${project!.id}/review`;
    const token = await signIn(supervisor!.email);
    const first = await api(path, token);
    log(`first page: ${first.items.length} interviews; GET /review, 20 clients`);
    const firstPage = await load({ url: `${BASE}${path}`, token, connections: 20, seconds: SECONDS });
    log('GET /review?flag=too_short, 20 clients');
    const byFlag = await load({ url: `${BASE}${path}?flag=too_short`, token, connections: 20, seconds: SECONDS });
    log('GET /review?interviewerId=…&fieldDay=…, 20 clients');
    const oneDay = await load({ url: `${BASE}${path}?interviewerId=${team[1]!.id}&fieldDay=${days[3]}`, token, connections: 20, seconds: SECONDS });
    // For scale on a busy machine: the lightest signed-in read (one project's summary) the same way.
    log('GET /projects/:id, 20 clients (for scale)');
    const lightest = await load({ url: `${BASE}/api/projects/${project!.id}`, token, connections: 20, seconds: SECONDS });
    console.log(JSON.stringify({
      machine: { cpus: cpus().length, loadAverageAtStart: loadAtStart, loadAverageAtEnd: loadavg().map((x) => Number(x.toFixed(2))) },
      contacts: CONTACTS, flagged: Number((await db.raw(`SELECT count(*) FROM interviews i WHERE cardinality(flags) > 0 OR id IN (SELECT interview_id FROM interview_findings UNION SELECT interview_id FROM backchecks) OR interviewer_id = ?`, [team[0]!.id])).rows[0].count), pageSize: first.items.length,
      firstPage, byFlag, oneInterviewerDay: oneDay, lightestRead: lightest,
    }, null, 2));
  } finally {
    await new Promise((r) => setTimeout(r, 1000));
    server.kill('SIGTERM');
    await db.destroy();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
