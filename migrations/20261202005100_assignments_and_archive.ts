import type { Knex } from 'knex';

// Archiving is a column, not a fourth stage: an archived project keeps the stage it had
// (closed), so everything that reads the stage (sync flags, the board) stays truthful,
// and restoring is clearing one column. Per-interviewer assignments hang off the team
// table, so taking someone off the team drops their assignment with it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('projects', (t) => {
    t.timestamp('archived_at', { useTz: true });
  });
  await knex.raw(
    `ALTER TABLE projects ADD CONSTRAINT projects_archived_closed_check
       CHECK (archived_at IS NULL OR status = 'closed')`,
  );
  await knex.schema.createTable('interviewer_assignments', (t) => {
    t.uuid('project_id').notNullable();
    t.uuid('user_id').notNullable();
    t.integer('target').notNullable();
    /** Quota cells to work; empty means any cell. */
    t.specificType('cell_ids', 'uuid[]').notNullable().defaultTo('{}');
    t.uuid('updated_by').references('users.id').onDelete('SET NULL');
    t.timestamp('updated_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['project_id', 'user_id']);
    t.foreign(['project_id', 'user_id']).references(['project_id', 'user_id']).inTable('project_members').onDelete('CASCADE');
  });
  await knex.raw(
    `ALTER TABLE interviewer_assignments ADD CONSTRAINT interviewer_assignments_target_check
       CHECK (target BETWEEN 1 AND 1000000)`,
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('interviewer_assignments');
  await knex.raw('ALTER TABLE projects DROP CONSTRAINT projects_archived_closed_check');
  await knex.schema.alterTable('projects', (t) => {
    t.dropColumn('archived_at');
  });
}
