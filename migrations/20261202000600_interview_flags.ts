import type { Knex } from 'knex';

// Flags on an interview the server kept but a supervisor should look at (codes listed in
// api/src/interviews/flags.ts). The partial index lets the quota board count flagged
// interviews without reading the unflagged ones.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('interviews', (t) => {
    t.specificType('flags', 'text[]').notNullable().defaultTo('{}');
  });
  await knex.raw(`CREATE INDEX interviews_flagged ON interviews (project_id) WHERE cardinality(flags) > 0`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX interviews_flagged');
  await knex.schema.alterTable('interviews', (t) => {
    t.dropColumn('flags');
  });
}
