// One-time links (invitation, password reset). The link carries `id.secret`; only the
// SHA-256 of the secret is stored. A token is spent on first use, expires, and issuing a
// new one for the same person and purpose spends the older ones, so only the latest link works.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { createHash, randomBytes, randomUUID, timingSafeEqual } from 'node:crypto';
import { KNEX } from '../database/database.constants.js';
import type { OneTimeTokenPurpose, OneTimeTokenRow } from '../database/tables.js';

export type TokenCheck =
  | { kind: 'ok'; row: OneTimeTokenRow }
  | { kind: 'invalid' }
  | { kind: 'expired' }
  | { kind: 'used' };

const sha256 = (value: string): string => createHash('sha256').update(value).digest('hex');

function parse(token: string): { id: string; secret: string } | null {
  const match = /^([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})\.([A-Za-z0-9_-]{43})$/.exec(token);
  return match ? { id: match[1]!, secret: match[2]! } : null;
}

@Injectable()
export class OneTimeTokensRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async issue(userId: string, purpose: OneTimeTokenPurpose, ttlHours: number, trx: Knex | Knex.Transaction = this.db): Promise<string> {
    await this.spendAll(userId, purpose, trx);
    const id = randomUUID();
    const secret = randomBytes(32).toString('base64url');
    await trx('one_time_tokens').insert({
      id,
      user_id: userId,
      purpose,
      token_hash: sha256(secret),
      expires_at: new Date(Date.now() + ttlHours * 3_600_000),
    });
    return `${id}.${secret}`;
  }

  /** Checks a token without spending it; `forUpdate` locks its row inside a transaction. */
  async check(token: string, trx: Knex | Knex.Transaction = this.db, forUpdate = false): Promise<TokenCheck> {
    const parsed = parse(token);
    if (!parsed) return { kind: 'invalid' };
    const query = trx('one_time_tokens').where({ id: parsed.id });
    const row = await (forUpdate ? query.forUpdate() : query).first();
    if (!row || !matches(row.token_hash, parsed.secret)) return { kind: 'invalid' };
    if (row.used_at) return { kind: 'used' };
    if (row.expires_at.getTime() <= Date.now()) return { kind: 'expired' };
    return { kind: 'ok', row };
  }

  /** Spends every open token of the person (of one purpose, or all). */
  async spendAll(userId: string, purpose: OneTimeTokenPurpose | null, trx: Knex | Knex.Transaction = this.db): Promise<void> {
    const query = trx('one_time_tokens').where({ user_id: userId }).whereNull('used_at');
    if (purpose) query.where({ purpose });
    await query.update({ used_at: trx.fn.now() });
  }

  /** When the person's latest token of this purpose was issued, if any. */
  async lastIssued(userId: string, purpose: OneTimeTokenPurpose): Promise<Date | null> {
    const row = await this.db('one_time_tokens').where({ user_id: userId, purpose }).max({ at: 'created_at' }).first();
    return (row?.at as Date | null | undefined) ?? null;
  }
}

function matches(storedHash: string, secret: string): boolean {
  const a = Buffer.from(storedHash, 'hex');
  const b = Buffer.from(sha256(secret), 'hex');
  return a.length === b.length && timingSafeEqual(a, b);
}
