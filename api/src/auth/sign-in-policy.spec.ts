import { describe, expect, it } from 'vitest';
import { accountDelaySeconds, describeWait, secondsToWait, withFailure, type FailureRule } from './sign-in-policy.js';

const growing: FailureRule = { kind: 'growing-delay', freeFailures: 5 };
const window: FailureRule = { kind: 'window', limit: 100, windowSeconds: 900 };
const t0 = new Date('2026-12-02T10:00:00Z');
const at = (seconds: number) => new Date(t0.getTime() + seconds * 1000);

describe('account delay schedule', () => {
  it('lets the first five failures through, then doubles from 15 s up to 15 minutes and stays there', () => {
    const delays = Array.from({ length: 14 }, (_, i) => accountDelaySeconds(i, 5));
    expect(delays).toEqual([0, 0, 0, 0, 0, 15, 30, 60, 120, 240, 480, 900, 900, 900]);
    expect(accountDelaySeconds(1_000_000, 5)).toBe(900);
  });

  it('after the sixth failure in a row, waits 30 s from the last failure, then lets the next try in', () => {
    let count;
    for (let i = 0; i < 6; i++) count = withFailure(growing, count, at(i));
    expect(count).toEqual({ failures: 6, firstFailedAt: at(0), lastFailedAt: at(5) });
    expect(secondsToWait(growing, count, at(5))).toBe(30);
    expect(secondsToWait(growing, count, at(34.5))).toBe(1);
    expect(secondsToWait(growing, count, at(35))).toBe(0);
  });

  it('forgets an account that has been quiet for a day', () => {
    const count = { failures: 40, firstFailedAt: t0, lastFailedAt: t0 };
    expect(secondsToWait(growing, count, at(60))).toBe(840);
    expect(withFailure(growing, count, at(86_400))).toEqual({ failures: 1, firstFailedAt: at(86_400), lastFailedAt: at(86_400) });
  });
});

describe('per-address window', () => {
  it('allows up to the limit within the window, then waits for the window to end', () => {
    const count = { failures: 99, firstFailedAt: t0, lastFailedAt: at(100) };
    expect(secondsToWait(window, count, at(100))).toBe(0);
    const full = withFailure(window, count, at(100));
    expect(secondsToWait(window, full, at(100))).toBe(800);
    expect(secondsToWait(window, full, at(900))).toBe(0);
    expect(withFailure(window, full, at(900)).failures).toBe(1);
  });
});

describe('describeWait', () => {
  it('reads in seconds under a minute and in whole minutes (rounded up) from there', () => {
    expect([1, 15, 59, 60, 61, 900].map(describeWait)).toEqual([
      '1 second',
      '15 seconds',
      '59 seconds',
      '1 minute',
      '2 minutes',
      '15 minutes',
    ]);
  });
});
