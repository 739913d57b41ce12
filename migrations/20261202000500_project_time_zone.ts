import type { Knex } from 'knex';

// Field days and "today" on the quota board follow the project's own time zone, not the
// server's: a contact at 23:30 local time belongs to that day's fieldwork.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('projects', (t) => {
    t.text('time_zone').notNullable().defaultTo('UTC');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('projects', (t) => {
    t.dropColumn('time_zone');
  });
}
