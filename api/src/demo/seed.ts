// Seeds the invented Vellmoor demo: one agency, one user per role plus a field team of
// eight interviewers, the tram extension project with its quota targets, and a few
// hundred interviews over the field days so far. It goes through the same services as
// the API, so it runs compiled: `node api/dist/demo/seed.js` (npm start does this).
// Changes nothing once the agency exists.
import 'reflect-metadata';
import type { Knex } from 'knex';
import { randomUUID } from 'node:crypto';
import { hashPassword } from '../auth/password.js';
import type { AuthUser, Role } from '../common/roles.js';
import { createKnex } from '../database/database.module.js';
import { SyncService } from '../interviews/sync.service.js';
import { ProjectAccess } from '../projects/project-access.service.js';
import { QualityScheduler } from '../quality/quality-jobs.js';
import { runQualityCheck } from '../quality/quality-check.js';
import { CellAllocator } from '../quotas/cell-allocator.js';
import { CellsService } from '../quotas/cells.service.js';
import { TargetsService } from '../quotas/targets.service.js';
import { habitsOf } from './habits.js';
import { addOutcomeDetails } from './outcome-details.js';
import { seedBackchecks } from './backchecks.js';
import { seedBenchmarks } from './benchmarks.js';
import { drawRespondent, seeded, VELLMOOR_AGE_SEX, VELLMOOR_TARGETS } from './vellmoor.js';

export const DEMO_PASSWORD = 'plumbline-demo';
export const DEMO_ORGANISATION = 'Vellmoor Field Research';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@vellmoor.example', name: 'Imke Dorrance', role: 'admin' },
  { email: 'lead@vellmoor.example', name: 'Tomas Hale', role: 'lead' },
  { email: 'supervisor@vellmoor.example', name: 'Rhea Quillon', role: 'supervisor' },
  { email: 'interviewer@vellmoor.example', name: 'Owen Marsh', role: 'interviewer' },
  { email: 'client@vellmoor.example', name: 'Vellmoor Transit Board', role: 'client' },
  { email: 'a.fenwick@vellmoor.example', name: 'Alys Fenwick', role: 'interviewer' },
  { email: 'b.osei@vellmoor.example', name: 'Bram Osei', role: 'interviewer' },
  { email: 'c.lindqvist@vellmoor.example', name: 'Cato Lindqvist', role: 'interviewer' },
  { email: 'd.rourke@vellmoor.example', name: 'Dana Rourke', role: 'interviewer' },
  { email: 'e.varga@vellmoor.example', name: 'Edit Varga', role: 'interviewer' },
  { email: 'f.mbeki@vellmoor.example', name: 'Femi Mbeki', role: 'interviewer' },
  { email: 'g.tallis@vellmoor.example', name: 'Greer Tallis', role: 'interviewer' },
];

/** The scenario's column-style names as a lead would type them in the project ("age band"). */
/** The name screens show for a scenario column ("age_band" → "Age band"); the column stays the file name. */
const shownAs = (name: string) => name.charAt(0).toUpperCase() + name.slice(1).replace(/_/g, ' ');

const DAY = 86_400_000;
const isoDay = (t: number) => new Date(t).toISOString().slice(0, 10);

/** Non-completes per complete, roughly as a door-to-door team might log them (invented). */
const OTHER_OUTCOMES: [string, number][] = [['refusal', 0.45], ['non_contact', 0.6], ['partial', 0.05], ['not_eligible', 0.08], ['other', 0.03]];

export async function seedDemo(db: Knex, today = Date.now()): Promise<boolean> {
  const existing = await db('organisations').where({ name: DEMO_ORGANISATION }).first();
  if (existing) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  // Field days start at midnight (UTC), so the hours worked are the same whenever the demo is seeded.
  const fieldStart = Math.floor(today / DAY) * DAY - 16 * DAY;

  const { project, interviewers } = await db.transaction(async (trx) => {
    const [org] = await trx('organisations').insert({ name: DEMO_ORGANISATION }).returning('*');
    const users = await trx('users')
      .insert(DEMO_USERS.map((u) => ({ ...u, organisation_id: org!.id, password_hash: passwordHash })))
      .returning('*');
    const [project] = await trx('projects')
      .insert({
        organisation_id: org!.id,
        name: 'Vellmoor tram extension',
        topic: 'Support for extending the tram line from Vellmoor Cross to the eastern villages',
        headline_question: 'Do you support extending the tram line to the eastern villages?',
        field_start: isoDay(fieldStart),
        field_end: isoDay(today + 4 * DAY),
        target_size: 1200,
        time_zone: 'Europe/London',
        status: 'fieldwork',
      })
      .returning('*');
    await trx('project_members').insert(
      users.filter((u) => u.role !== 'admin' && u.role !== 'lead').map((u) => ({ project_id: project!.id, user_id: u.id })),
    );
    return { project: project!, interviewers: users.filter((u) => u.role === 'interviewer') };
  });

  const cells = new CellsService(db);
  await new TargetsService(db, new CellAllocator(db), cells).save(project.id, {
    variables: Object.entries(VELLMOOR_TARGETS).map(([name, shares]) => ({
      name: shownAs(name),
      columnName: name,
      interlocked: name === 'age_band' || name === 'sex',
      categories: Object.entries(shares).map(([label, share]) => ({ label, share })),
    })),
    jointShares: Object.entries(VELLMOOR_AGE_SEX).flatMap(([age, { female, male }]) => [
      { categories: [age, 'female'], share: female },
      { categories: [age, 'male'], share: male },
    ]),
  });
  const { variables } = await cells.cells(project.id);
  const idOf = (variable: string, label: string) => {
    const v = variables.find((x) => x.name === shownAs(variable))!;
    return [v.id, v.categories.find((c) => c.label === label)!.id] as const;
  };

  // Each interviewer works most field days and logs a few contacts; the demo account's
  // own work is part of it, so the interviewer's screens show real history.
  // A few of them have habits the quality rules flag (habits.ts).
  const random = seeded(20261116);
  const leaning = seeded(7);
  const sync = new SyncService(db, new ProjectAccess(db), cells, new QualityScheduler());
  for (const user of interviewers) {
    const actor: AuthUser = { id: user.id, organisationId: project.organisation_id, role: 'interviewer', email: user.email, name: user.name };
    const habits = habitsOf(user.email);
    const batch: object[] = [];
    for (let day = 0; day < 16; day++) {
      if (random() < 0.2) continue;
      const completes = 5 + Math.floor(random() * 7);
      let clock = fieldStart + day * DAY + habits.firstHour(random(), day) * 3_600_000;
      const contact = (disposition: string, extra: object = {}) => {
        const minutes = disposition === 'complete' ? habits.completeMinutes(random()) : 1 + random() * 3;
        const startedAt = new Date(clock).toISOString();
        clock += minutes * 60_000;
        batch.push({ id: randomUUID(), disposition, startedAt, endedAt: new Date(clock).toISOString(), ...extra });
        clock += habits.gapMinutes(random(), minutes) * 60_000;
      };
      for (let i = 0; i < completes; i++) {
        for (const [disposition, rate] of OTHER_OUTCOMES) if (random() < rate) contact(disposition);
        const r = drawRespondent(random);
        const categories = Object.fromEntries(Object.entries(r.categories).map(([v, c]) => idOf(v, c)));
        contact('complete', { categories, headlineAnswer: r.supports || (habits.lean > 0 && leaning() < habits.lean) });
      }
    }
    await sync.sync(actor, project.id, batch);
  }
  await addOutcomeDetails(db, project.id);
  await seedBackchecks(db, project.id, today);
  await seedBenchmarks(db, project.id, today);
  // The flags exist as soon as the demo starts (a server would queue this after each sync).
  await runQualityCheck(db, project.id);
  return true;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  if (!process.env.DATABASE_URL) {
    console.error('[plumbline] DATABASE_URL is not set');
    process.exit(1);
  }
  const db = createKnex(process.env.DATABASE_URL);
  seedDemo(db)
    .then((created) => console.log(created ? '[plumbline] demo data seeded' : '[plumbline] demo data already present'))
    .catch((error: unknown) => {
      console.error('[plumbline] seeding failed:', error instanceof Error ? error.message : error);
      process.exitCode = 1;
    })
    .finally(() => db.destroy());
}
