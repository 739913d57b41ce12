import type { Knex } from 'knex';

// Failed sign-ins replace the fixed-window hit counter: one row per key ("account:…",
// "device:…", "address:…"), kept in PostgreSQL so every API instance shares them.
// Successful sign-ins are never stored here.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.dropTable('throttle_hits');
  await knex.schema.createTable('sign_in_failures', (t) => {
    t.text('key').primary();
    t.integer('failures').notNullable();
    t.timestamp('first_failed_at', { useTz: true }).notNullable();
    t.timestamp('last_failed_at', { useTz: true }).notNullable();
    t.index(['last_failed_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sign_in_failures');
  await knex.schema.createTable('throttle_hits', (t) => {
    t.text('key').primary();
    t.integer('hits').notNullable();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.index(['expires_at']);
  });
}
