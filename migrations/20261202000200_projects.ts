import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('projects', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('organisation_id').notNullable().references('organisations.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('topic').notNullable().defaultTo('');
    t.date('field_start');
    t.date('field_end');
    t.integer('target_size').notNullable().defaultTo(0);
    t.text('status').notNullable().defaultTo('setup');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['organisation_id']);
  });
  await knex.raw(
    `ALTER TABLE projects ADD CONSTRAINT projects_status_check
       CHECK (status IN ('setup', 'fieldwork', 'closed'))`,
  );
  await knex.raw(
    `ALTER TABLE projects ADD CONSTRAINT projects_field_dates_check
       CHECK (field_start IS NULL OR field_end IS NULL OR field_start <= field_end)`,
  );

  // Who works on or reads a project; interviewers and clients see only these.
  await knex.schema.createTable('project_members', (t) => {
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(['project_id', 'user_id']);
    t.index(['user_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('project_members');
  await knex.schema.dropTable('projects');
}
