import type { Knex } from 'knex';

// Sign-in attempt counters, kept in PostgreSQL so every API instance shares them.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('throttle_hits', (t) => {
    t.text('key').primary();
    t.integer('hits').notNullable();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.index(['expires_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('throttle_hits');
}
