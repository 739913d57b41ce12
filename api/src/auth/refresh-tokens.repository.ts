// Sign-ins and their refresh tokens. Each sign-in is one row in `sessions` (its id is the
// refresh-token family and rides in every access token of that sign-in); only a SHA-256 of
// each refresh token's secret is stored. Tokens rotate on every use. Presenting a rotated
// token again within REFRESH_REUSE_GRACE_SECONDS (two tabs refreshing at once, a retry after
// a lost reply) issues one more successor of the same family; later, it counts as theft and
// revokes the whole sign-in. Every rotation locks its session row first, so parallel
// rotations of one family, and a sign-out racing a rotation, take turns.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { createHash, randomBytes, randomUUID, timingSafeEqual } from 'node:crypto';
import { KNEX } from '../database/database.constants.js';
import type { RefreshTokenRow } from '../database/tables.js';

/** How long a just-rotated refresh token may be presented again without ending the sign-in. */
export const REFRESH_REUSE_GRACE_SECONDS = 30;

export type RefreshOutcome =
  | { kind: 'ok'; userId: string; sessionId: string; token: string }
  | { kind: 'invalid' }
  | { kind: 'expired' }
  | { kind: 'revoked' }
  | { kind: 'reused' };

export interface IssuedToken {
  sessionId: string;
  token: string;
}

function sha256(value: string): string {
  return createHash('sha256').update(value).digest('hex');
}

function parse(token: string): { id: string; secret: string } | null {
  const match = /^([0-9a-f-]{36})\.([A-Za-z0-9_-]{43})$/.exec(token);
  return match ? { id: match[1]!, secret: match[2]! } : null;
}

@Injectable()
export class RefreshTokensRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  /** Starts a new sign-in: its session row and first refresh token. */
  startSession(userId: string, ttlSeconds: number): Promise<IssuedToken> {
    return this.db.transaction(async (trx) => {
      const sessionId = randomUUID();
      await trx('sessions').insert({ id: sessionId, user_id: userId });
      return { sessionId, token: await this.issue(trx, userId, sessionId, ttlSeconds) };
    });
  }

  /** Spends a refresh token and issues a successor, in one transaction. */
  rotate(token: string, ttlSeconds: number): Promise<RefreshOutcome> {
    const parsed = parse(token);
    if (!parsed) return Promise.resolve({ kind: 'invalid' });
    return this.db.transaction(async (trx): Promise<RefreshOutcome> => {
      const found = await trx('refresh_tokens').where({ id: parsed.id }).first('family_id');
      if (!found) return { kind: 'invalid' };
      const session = await trx('sessions').where({ id: found.family_id }).forUpdate().first();
      // Read again under the session's lock: a parallel rotation may just have spent it.
      const row = await trx('refresh_tokens').where({ id: parsed.id }).first();
      if (!session || !row || !this.matches(row, parsed.secret)) return { kind: 'invalid' };
      if (session.revoked_at) return { kind: 'revoked' };
      if (row.expires_at.getTime() <= Date.now()) return { kind: 'expired' };
      if (row.replaced_at) {
        if (Date.now() - row.replaced_at.getTime() > REFRESH_REUSE_GRACE_SECONDS * 1000) {
          await trx('sessions').where({ id: session.id }).update({ revoked_at: new Date() });
          return { kind: 'reused' };
        }
      } else {
        await trx('refresh_tokens').where({ id: row.id }).update({ replaced_at: new Date() });
      }
      const next = await this.issue(trx, row.user_id, session.id, ttlSeconds);
      return { kind: 'ok', userId: row.user_id, sessionId: session.id, token: next };
    });
  }

  /** Ends the sign-in the token belongs to; unknown tokens are ignored. */
  async revokeByToken(token: string): Promise<void> {
    const parsed = parse(token);
    if (!parsed) return;
    const row = await this.db('refresh_tokens').where({ id: parsed.id }).first();
    if (row && this.matches(row, parsed.secret)) await this.revokeSession(row.family_id);
  }

  /** Ends one sign-in at once: its refresh tokens and access tokens stop working. */
  async revokeSession(sessionId: string): Promise<void> {
    await this.db('sessions').where({ id: sessionId }).whereNull('revoked_at').update({ revoked_at: new Date() });
  }

  /** Ends every sign-in of a user (e.g. when an account is disabled). */
  async revokeAllForUser(userId: string): Promise<void> {
    await this.db('sessions').where({ user_id: userId }).whereNull('revoked_at').update({ revoked_at: new Date() });
  }

  /** Whether an access token's sign-in still stands (checked on every request). */
  async isSessionActive(sessionId: string, userId: string): Promise<boolean> {
    const row = await this.db('sessions').where({ id: sessionId, user_id: userId }).whereNull('revoked_at').first('id');
    return row !== undefined;
  }

  private async issue(trx: Knex.Transaction, userId: string, sessionId: string, ttlSeconds: number): Promise<string> {
    const id = randomUUID();
    const secret = randomBytes(32).toString('base64url');
    await trx('refresh_tokens').insert({
      id,
      family_id: sessionId,
      user_id: userId,
      token_hash: sha256(secret),
      expires_at: new Date(Date.now() + ttlSeconds * 1000),
    });
    return `${id}.${secret}`;
  }

  private matches(row: RefreshTokenRow, secret: string): boolean {
    const a = Buffer.from(row.token_hash, 'hex');
    const b = Buffer.from(sha256(secret), 'hex');
    return a.length === b.length && timingSafeEqual(a, b);
  }
}
