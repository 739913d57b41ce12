// Seeds the invented Vellmoor demo: one agency, one user per role and the tram
// extension project shell. Runs on every `npm start` and changes nothing once present.
import knex, { type Knex } from 'knex';
import { hashPassword } from '../api/src/auth/password.js';
import type { Role } from '../api/src/common/roles.js';

export const DEMO_PASSWORD = 'plumbline-demo';
export const DEMO_ORGANISATION = 'Vellmoor Field Research';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@vellmoor.example', name: 'Imke Dorrance', role: 'admin' },
  { email: 'lead@vellmoor.example', name: 'Tomas Hale', role: 'lead' },
  { email: 'supervisor@vellmoor.example', name: 'Rhea Quillon', role: 'supervisor' },
  { email: 'interviewer@vellmoor.example', name: 'Owen Marsh', role: 'interviewer' },
  { email: 'client@vellmoor.example', name: 'Vellmoor Transit Board', role: 'client' },
];

export async function seedDemo(db: Knex): Promise<boolean> {
  const existing = await db('organisations').where({ name: DEMO_ORGANISATION }).first();
  if (existing) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (trx) => {
    const [org] = await trx('organisations').insert({ name: DEMO_ORGANISATION }).returning('*');
    const users = await trx('users')
      .insert(DEMO_USERS.map((u) => ({ ...u, organisation_id: org!.id, password_hash: passwordHash })))
      .returning('*');
    const [project] = await trx('projects')
      .insert({
        organisation_id: org!.id,
        name: 'Vellmoor tram extension',
        topic: 'Support for extending the tram line from Vellmoor Cross to the eastern villages',
        field_start: '2026-11-16',
        field_end: '2026-12-06',
        target_size: 1200,
        status: 'fieldwork',
      })
      .returning('*');
    await trx('project_members').insert(
      users.filter((u) => u.role !== 'admin').map((u) => ({ project_id: project!.id, user_id: u.id })),
    );
  });
  return true;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const db = knex({ client: 'pg', connection: process.env.DATABASE_URL });
  seedDemo(db)
    .then((created) => console.log(created ? '[plumbline] demo data seeded' : '[plumbline] demo data already present'))
    .catch((error: unknown) => {
      console.error('[plumbline] seeding failed:', error instanceof Error ? error.message : error);
      process.exitCode = 1;
    })
    .finally(() => db.destroy());
}
