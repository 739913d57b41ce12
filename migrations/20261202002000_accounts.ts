import type { Knex } from 'knex';

// People management: an invited person has no password until they set one through their
// one-time link; one-time links (invitation, password reset) are stored as SHA-256 hashes
// only, spent once and expiring.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('users', (t) => {
    t.text('password_hash').nullable().alter();
  });
  await knex.schema.createTable('one_time_tokens', (t) => {
    t.uuid('id').primary();
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.text('purpose').notNullable();
    t.text('token_hash').notNullable();
    t.timestamp('expires_at', { useTz: true }).notNullable();
    t.timestamp('used_at', { useTz: true });
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['user_id', 'purpose']);
  });
  await knex.raw(
    `ALTER TABLE one_time_tokens ADD CONSTRAINT one_time_tokens_purpose_check
       CHECK (purpose IN ('invitation', 'password_reset'))`,
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('one_time_tokens');
  // Invited people who never set a password cannot keep an account without one.
  await knex('users').whereNull('password_hash').delete();
  await knex.schema.alterTable('users', (t) => {
    t.text('password_hash').notNullable().alter();
  });
}
