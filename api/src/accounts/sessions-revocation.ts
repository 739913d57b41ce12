import type { Knex } from 'knex';

/**
 * Ends every sign-in of a person: revokes all their refresh-token families (a disabled
 * account, a password set through a link): each sign-in is a row of `sessions`, and access
 * tokens carry its id, so the auth module's per-request session check refuses them at once.
 */
export async function revokeAllSessions(db: Knex | Knex.Transaction, userId: string): Promise<void> {
  await db('sessions').where({ user_id: userId }).whereNull('revoked_at').update({ revoked_at: db.fn.now() });
}
