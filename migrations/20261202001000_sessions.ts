import type { Knex } from 'knex';

// One row per sign-in (a refresh-token family). Access tokens name their session, so
// revoking this one row ends the sign-in at once; rotations of a family lock it, so a
// rotation and a revocation of the same sign-in never interleave.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sessions', (t) => {
    t.uuid('id').primary();
    t.uuid('user_id').notNullable().references('users.id').onDelete('CASCADE');
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp('revoked_at', { useTz: true });
    t.index(['user_id']);
  });
  await knex.raw(`
    INSERT INTO sessions (id, user_id, created_at, revoked_at)
    SELECT family_id, (array_agg(user_id))[1], min(created_at), max(revoked_at)
    FROM refresh_tokens GROUP BY family_id`);
  await knex.schema.alterTable('refresh_tokens', (t) => {
    t.foreign('family_id').references('sessions.id').onDelete('CASCADE');
    t.dropColumn('revoked_at');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('refresh_tokens', (t) => {
    t.timestamp('revoked_at', { useTz: true });
    t.dropForeign(['family_id']);
  });
  await knex.raw(`
    UPDATE refresh_tokens SET revoked_at = sessions.revoked_at
    FROM sessions WHERE sessions.id = refresh_tokens.family_id AND sessions.revoked_at IS NOT NULL`);
  await knex.schema.dropTable('sessions');
}
