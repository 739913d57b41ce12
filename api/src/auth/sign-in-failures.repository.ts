// Failed sign-in counters in PostgreSQL (`sign_in_failures`), so every API instance sees
// the same counts. An attempt is counted as a failure *before* the password is checked
// (under row locks), and forgiven when it succeeds: parallel guesses therefore cannot all
// slip through before the first failure is recorded, and successes never count.
import { Inject, Injectable } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import { ACCOUNT_MEMORY_SECONDS, secondsToWait, withFailure, type FailureRule } from './sign-in-policy.js';

export interface CountedKey {
  key: string;
  rule: FailureRule;
}

@Injectable()
export class SignInFailuresRepository {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  /**
   * Counts an attempt against every key, unless one of them says to wait: then nothing is
   * counted and the longest wait in seconds is returned.
   */
  async reserve(keys: CountedKey[]): Promise<number> {
    const sorted = [...keys].sort((a, b) => a.key.localeCompare(b.key)); // one lock order: no deadlocks
    const wait = await this.db.transaction(async (trx): Promise<number> => {
      const now = new Date();
      const rows = [];
      for (const { key } of sorted) {
        await trx('sign_in_failures')
          .insert({ key, failures: 0, first_failed_at: now, last_failed_at: now })
          .onConflict('key')
          .ignore();
        rows.push((await trx('sign_in_failures').where({ key }).forUpdate().first())!);
      }
      const counts = rows.map((r) => ({ failures: r.failures, firstFailedAt: r.first_failed_at, lastFailedAt: r.last_failed_at }));
      const longest = Math.max(0, ...sorted.map((k, i) => secondsToWait(k.rule, counts[i], now)));
      if (longest > 0) throw new RolledBack(longest);
      for (const [i, { key, rule }] of sorted.entries()) {
        const next = withFailure(rule, counts[i], now);
        await trx('sign_in_failures')
          .where({ key })
          .update({ failures: next.failures, first_failed_at: next.firstFailedAt, last_failed_at: next.lastFailedAt });
      }
      return 0;
    }).catch((error: unknown) => {
      if (error instanceof RolledBack) return error.wait;
      throw error;
    });
    if (Math.random() < 0.01) await this.forgetOld();
    return wait;
  }

  /** A successful sign-in: the account's counter starts over; the address's attempt is taken back. */
  async forgive(reset: string[], takeBack: string[]): Promise<void> {
    await this.db.transaction(async (trx) => {
      await trx('sign_in_failures').whereIn('key', reset).delete();
      if (takeBack.length > 0) {
        await trx('sign_in_failures')
          .whereIn('key', takeBack)
          .update({ failures: trx.raw('greatest(failures - 1, 0)') });
      }
    });
  }

  /** Keeps the table small: counters no rule would still look at. */
  private async forgetOld(): Promise<void> {
    const cutoff = new Date(Date.now() - ACCOUNT_MEMORY_SECONDS * 1000);
    await this.db('sign_in_failures').where('last_failed_at', '<', cutoff).delete();
  }
}

/** Leaves the transaction without counting anything (the rows it may have created go too). */
class RolledBack extends Error {
  constructor(readonly wait: number) {
    super('rolled back');
  }
}
