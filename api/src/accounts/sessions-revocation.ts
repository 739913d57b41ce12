import type { Knex } from 'knex';

/**
 * Ends every sign-in of a person: revokes all their refresh-token families (a disabled
 * account, a password set through a link). Access tokens already issued are refused by the
 * per-request user check (a disabled account) or by the session check of the auth module.
 */
export async function revokeAllSessions(db: Knex | Knex.Transaction, userId: string): Promise<void> {
  await db('refresh_tokens').where({ user_id: userId }).whereNull('revoked_at').update({ revoked_at: db.fn.now() });
}
