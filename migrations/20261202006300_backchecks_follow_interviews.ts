import type { Knex } from 'knex';

// A back-check belongs to its interview: deleting the interview (tests and clean-ups do; the
// product never deletes interviews) deletes its back-check with it, as interview_findings do,
// instead of refusing the delete.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('backchecks', (t) => {
    t.dropForeign(['interview_id']);
    t.foreign('interview_id').references('interviews.id').onDelete('CASCADE');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('backchecks', (t) => {
    t.dropForeign(['interview_id']);
    t.foreign('interview_id').references('interviews.id');
  });
}
