// The fault suite's fieldwork: one project with the demo's quota targets, a lead, a
// supervisor and ten interviewers who each carry two devices (a phone and a tablet restored
// from the same backup), so the two outboxes share part of their interviews' ids.
import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import type { Role } from '../../api/src/common/roles.js';
import { hashPassword } from '../../api/src/auth/password.js';
import { drawRespondent, seeded, VELLMOOR_TARGETS } from '../../api/src/demo/vellmoor.js';
import type { Interview } from './device.js';

export const PASSWORD = 'fault suite password 1';

export interface Fieldwork {
  projectId: string;
  lead: string;
  supervisor: string;
  interviewers: string[];
}

export async function seedFieldwork(db: Knex, interviewers: number): Promise<Fieldwork> {
  const hash = await hashPassword(PASSWORD);
  const org = (await db('organisations').insert({ name: 'Fault suite agency' }).returning('*'))[0]!;
  const user = (role: Role, email: string) => ({ organisation_id: org.id, email, name: email, role, password_hash: hash });
  const emails = Array.from({ length: interviewers }, (_, i) => `int${i + 1}@faults.example`);
  const rows = await db('users')
    .insert([user('lead', 'lead@faults.example'), user('supervisor', 'sup@faults.example'), ...emails.map((e) => user('interviewer', e))])
    .returning('*');
  const project = (
    await db('projects')
      .insert({ organisation_id: org.id, name: 'Faults', target_size: 100_000, headline_question: 'Support?', status: 'fieldwork' })
      .returning('*')
  )[0]!;
  await db('project_members').insert(rows.filter((r) => r.role === 'interviewer').map((r) => ({ project_id: project.id, user_id: r.id })));
  return { projectId: project.id, lead: 'lead@faults.example', supervisor: 'sup@faults.example', interviewers: emails };
}

export const targetsBody = {
  variables: Object.entries(VELLMOOR_TARGETS).map(([name, shares]) => ({
    name,
    interlocked: name === 'age_band' || name === 'sex',
    categories: Object.entries(shares).map(([label, share]) => ({ label, share })),
  })),
};

type Targets = { variables: { id: string; name: string; categories: { id: string; label: string }[] }[] };

/** Draws interviews from the demo's scenario: mostly completes, about one in seven a refusal. */
export function interviewMaker(targets: Targets, seed: number): () => Interview {
  const random = seeded(seed);
  return () => {
    const startedAt = '2026-11-20T10:00:00Z';
    const endedAt = '2026-11-20T10:15:00Z';
    if (random() < 0.15) return { id: randomUUID(), disposition: 'refusal', startedAt, endedAt };
    const r = drawRespondent(random);
    const categories: Record<string, string> = {};
    for (const v of targets.variables) categories[v.id] = v.categories.find((c) => c.label === r.categories[v.name])!.id;
    return { id: randomUUID(), disposition: 'complete', categories, headlineAnswer: r.supports, startedAt, endedAt };
  };
}

/** Fisher–Yates with the suite's seeded generator, so shared ids land in different batches. */
export function shuffled<T>(items: T[], random: () => number): T[] {
  const out = [...items];
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [out[i], out[j]] = [out[j] as T, out[i] as T];
  }
  return out;
}
