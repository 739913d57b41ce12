// Sign-in attempts are counted per client address and e-mail in PostgreSQL (fixed
// window), so the limit holds across API instances.
import { ExecutionContext, HttpException, HttpStatus, Inject, Injectable, Module } from '@nestjs/common';
import { ThrottlerGuard, type ThrottlerStorage } from '@nestjs/throttler';
import type { ThrottlerStorageRecord } from '@nestjs/throttler/dist/throttler-storage-record.interface.js';
import type { ThrottlerLimitDetail } from '@nestjs/throttler/dist/throttler.guard.interface.js';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';

@Injectable()
export class PostgresThrottlerStorage implements ThrottlerStorage {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async increment(key: string, ttl: number, limit: number): Promise<ThrottlerStorageRecord> {
    const result = await this.db.raw<{ rows: { hits: number; seconds_left: number }[] }>(
      `INSERT INTO throttle_hits (key, hits, expires_at)
       VALUES (?, 1, now() + make_interval(secs => ?))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN throttle_hits.expires_at <= now() THEN 1 ELSE throttle_hits.hits + 1 END,
         expires_at = CASE WHEN throttle_hits.expires_at <= now() THEN EXCLUDED.expires_at ELSE throttle_hits.expires_at END
       RETURNING hits, ceil(extract(epoch FROM expires_at - now()))::int AS seconds_left`,
      [key, ttl / 1000],
    );
    const row = result.rows[0]!;
    // Now and then, forget windows that ended long ago so the table stays small.
    if (Math.random() < 0.01) {
      await this.db('throttle_hits').where('expires_at', '<', this.db.raw("now() - interval '1 hour'")).delete();
    }
    const isBlocked = row.hits > limit;
    return { totalHits: row.hits, timeToExpire: row.seconds_left, isBlocked, timeToBlockExpire: isBlocked ? row.seconds_left : 0 };
  }
}

@Module({ providers: [PostgresThrottlerStorage], exports: [PostgresThrottlerStorage] })
export class ThrottleStorageModule {}

@Injectable()
export class SignInThrottleGuard extends ThrottlerGuard {
  protected override async getTracker(req: Record<string, unknown>): Promise<string> {
    const body = req.body as { email?: unknown } | undefined;
    const email = typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
    return `${String(req.ip)}|${email}`;
  }

  protected override async throwThrottlingException(
    _context: ExecutionContext,
    detail: ThrottlerLimitDetail,
  ): Promise<void> {
    throw new HttpException(
      `Too many sign-in attempts; try again in ${Math.max(1, detail.timeToExpire)} seconds`,
      HttpStatus.TOO_MANY_REQUESTS,
    );
  }
}
