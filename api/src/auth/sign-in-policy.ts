// How failed sign-ins slow the next attempt: plain functions over one counter row, so the
// schedule can be tested without a database. Two kinds of counter:
// - per account (or per recognised device and account): a few free failures, then a delay
//   that doubles with each failure and is capped, so an attacker who knows an e-mail can
//   slow its owner down but never lock the account for good; forgotten after a quiet day;
// - per address, across accounts: a high limit in a fixed window, since the phones of a
//   whole field team may share one carrier NAT address.

export interface FailureCount {
  failures: number;
  firstFailedAt: Date;
  lastFailedAt: Date;
}

export type FailureRule =
  | { kind: 'growing-delay'; freeFailures: number }
  | { kind: 'window'; limit: number; windowSeconds: number };

/** The delay after the first failure beyond the free ones; it doubles from there. */
export const FIRST_DELAY_SECONDS = 15;
/** The longest an account is ever held back: never a permanent lockout. */
export const MAX_DELAY_SECONDS = 15 * 60;
/** An account's failures are forgotten after this long without a new one. */
export const ACCOUNT_MEMORY_SECONDS = 24 * 60 * 60;

/** Seconds to wait after `failures` failed sign-ins in a row on one account. */
export function accountDelaySeconds(failures: number, freeFailures: number): number {
  if (failures < freeFailures) return 0;
  const doublings = Math.min(failures - freeFailures, 30);
  return Math.min(MAX_DELAY_SECONDS, FIRST_DELAY_SECONDS * 2 ** doublings);
}

function isStale(rule: FailureRule, count: FailureCount, now: Date): boolean {
  return rule.kind === 'growing-delay'
    ? now.getTime() - count.lastFailedAt.getTime() >= ACCOUNT_MEMORY_SECONDS * 1000
    : now.getTime() - count.firstFailedAt.getTime() >= rule.windowSeconds * 1000;
}

/** Whole seconds until another attempt may be made under this counter; 0 when it may now. */
export function secondsToWait(rule: FailureRule, count: FailureCount | undefined, now: Date): number {
  if (!count || count.failures === 0 || isStale(rule, count, now)) return 0;
  let until: number;
  if (rule.kind === 'growing-delay') {
    until = count.lastFailedAt.getTime() + accountDelaySeconds(count.failures, rule.freeFailures) * 1000;
  } else {
    if (count.failures < rule.limit) return 0;
    until = count.firstFailedAt.getTime() + rule.windowSeconds * 1000;
  }
  return Math.max(0, Math.ceil((until - now.getTime()) / 1000));
}

/** The counter after one more failure at `now`. */
export function withFailure(rule: FailureRule, count: FailureCount | undefined, now: Date): FailureCount {
  if (!count || count.failures === 0 || isStale(rule, count, now)) {
    return { failures: 1, firstFailedAt: now, lastFailedAt: now };
  }
  return { failures: count.failures + 1, firstFailedAt: count.firstFailedAt, lastFailedAt: now };
}

/** "45 seconds", "1 minute", "15 minutes": how a wait reads in a message. */
export function describeWait(seconds: number): string {
  if (seconds < 60) return `${seconds} second${seconds === 1 ? '' : 's'}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? '' : 's'}`;
}
