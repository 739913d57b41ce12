// The demo's back-checks: the interviews selected as the demo's completes arrived get invented
// contact-sheet references ("VM-0412"), and the supervisor has called most of the older ones
// back (mostly confirmed, one not confirmed with what differed, one not reached); the rest and
// the last two days' are pending, so the Back-checks page shows both lists after `npm start`.
import type { Knex } from 'knex';

const DAY = 86_400_000;

export async function seedBackchecks(db: Knex, projectId: string, today: number): Promise<void> {
  const supervisor = await db('users as u')
    .join('project_members as m', 'm.user_id', 'u.id')
    .where({ 'm.project_id': projectId, 'u.role': 'supervisor' })
    .first('u.id');
  const rows = (await db('backchecks as b')
    .join('interviews as i', 'i.id', 'b.interview_id')
    .where('b.project_id', projectId)
    .orderBy(['i.ended_at', 'b.interview_id'])
    .select('b.interview_id', 'i.ended_at')) as { interview_id: string; ended_at: Date }[];
  const older = rows.filter((r) => r.ended_at.getTime() < today - 2 * DAY);
  const done = older.slice(0, Math.floor(older.length * 0.7));
  for (const [index, row] of rows.entries()) {
    await db('backchecks').where({ interview_id: row.interview_id }).update({ respondent_reference: `VM-${String(401 + index * 7).padStart(4, '0')}` });
  }
  if (!supervisor) return;
  for (const [index, row] of done.entries()) {
    const outcome = index === 3 ? 'not_confirmed' : index === 8 ? 'not_reached' : 'confirmed';
    await db('backchecks')
      .where({ interview_id: row.interview_id })
      .update({
        outcome,
        outcome_note: outcome === 'not_confirmed' ? 'Respondent remembers a short doorstep chat, not a 20-minute interview; says they were not asked about the tram.' : null,
        recorded_by: supervisor.id,
        recorded_at: new Date(row.ended_at.getTime() + DAY + index * 60_000),
      });
  }
}
