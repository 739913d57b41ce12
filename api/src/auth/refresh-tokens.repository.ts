// Refresh tokens: only a SHA-256 of each token's secret is stored. Tokens rotate on
// every use; each sign-in is one family, and using a rotated token again revokes the
// whole family (the token may have been stolen).
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { createHash, randomBytes, randomUUID, timingSafeEqual } from 'node:crypto';
import { KNEX } from '../database/database.constants.js';
import type { RefreshTokenRow } from '../database/tables.js';

export type RefreshOutcome =
  | { kind: 'ok'; userId: string; token: string }
  | { kind: 'invalid' }
  | { kind: 'expired' }
  | { kind: 'revoked' }
  | { kind: 'reused' };

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

  async issue(userId: string, ttlSeconds: number, familyId: string = randomUUID(), trx?: Knex.Transaction) {
    const id = randomUUID();
    const secret = randomBytes(32).toString('base64url');
    await (trx ?? this.db)('refresh_tokens').insert({
      id,
      family_id: familyId,
      user_id: userId,
      token_hash: sha256(secret),
      expires_at: new Date(Date.now() + ttlSeconds * 1000),
    });
    return `${id}.${secret}`;
  }

  /** Spends a refresh token and issues its successor, in one transaction. */
  rotate(token: string, ttlSeconds: number): Promise<RefreshOutcome> {
    const parsed = parse(token);
    if (!parsed) return Promise.resolve({ kind: 'invalid' });
    return this.db.transaction(async (trx) => {
      const row = await trx('refresh_tokens').where({ id: parsed.id }).forUpdate().first();
      if (!row || !this.matches(row, parsed.secret)) return { kind: 'invalid' } as const;
      if (row.revoked_at) return { kind: 'revoked' } as const;
      if (row.replaced_at) {
        await this.revokeFamily(row.family_id, trx);
        return { kind: 'reused' } as const;
      }
      if (row.expires_at.getTime() <= Date.now()) return { kind: 'expired' } as const;
      await trx('refresh_tokens').where({ id: row.id }).update({ replaced_at: trx.fn.now() });
      const next = await this.issue(row.user_id, ttlSeconds, row.family_id, trx);
      return { kind: 'ok', userId: row.user_id, token: next } as const;
    });
  }

  /** Revokes the sign-in the token belongs to; unknown tokens are ignored. */
  async revokeByToken(token: string): Promise<void> {
    const parsed = parse(token);
    if (!parsed) return;
    const row = await this.db('refresh_tokens').where({ id: parsed.id }).first();
    if (row && this.matches(row, parsed.secret)) await this.revokeFamily(row.family_id);
  }

  private async revokeFamily(familyId: string, trx?: Knex.Transaction): Promise<void> {
    await (trx ?? this.db)('refresh_tokens')
      .where({ family_id: familyId })
      .whereNull('revoked_at')
      .update({ revoked_at: this.db.fn.now() });
  }

  private matches(row: RefreshTokenRow, secret: string): boolean {
    const a = Buffer.from(row.token_hash, 'hex');
    const b = Buffer.from(sha256(secret), 'hex');
    return a.length === b.length && timingSafeEqual(a, b);
  }
}
