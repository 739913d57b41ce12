import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { currentShare, selectArrivals, selectionHash, type Arrival } from './selection.js';

const settings = { share: 0.1, raiseAfterNotConfirmed: 0.1 };
const arrivals = (n: number, interviewerId = 'ann'): Arrival[] => Array.from({ length: n }, () => ({ interviewId: randomUUID(), interviewerId }));
/** Ann already has a back-check, so only the hash decides. */
const hasOne = new Map([['ann', { selected: 1, notConfirmed: 0 }]]);
/** Binomial(n, p) stays within 4 standard deviations but for about 6 in 100,000 draws. */
const within4sd = (count: number, n: number, p: number) => Math.abs(count - n * p) <= 4 * Math.sqrt(n * p * (1 - p));

describe('back-check selection', () => {
  it('gives the same sample for the same seed and data, another for another seed', () => {
    const batch = arrivals(2000);
    const first = selectArrivals('seed-a', settings, batch, hasOne);
    expect(selectArrivals('seed-a', settings, batch, hasOne)).toEqual(first);
    expect(selectArrivals('seed-b', settings, batch, hasOne).map((s) => s.interviewId)).not.toEqual(first.map((s) => s.interviewId));
  });

  it('selects about the share: 10% of 10,000 completes within a binomial bound', () => {
    const n = 10_000;
    const chosen = selectArrivals('vellmoor', settings, arrivals(n), hasOne);
    expect(within4sd(chosen.length, n, 0.1)).toBe(true);
    expect(chosen.every((s) => s.shareAtSelection === 0.1)).toBe(true);
  });

  it('raises the share by the set step for each not-confirmed back-check, up to all', () => {
    const n = 5000;
    const raised = selectArrivals('vellmoor', settings, arrivals(n), new Map([['ann', { selected: 3, notConfirmed: 2 }]]));
    expect(within4sd(raised.length, n, 0.3)).toBe(true);
    expect(raised[0]!.shareAtSelection).toBeCloseTo(0.3, 12);
    expect(currentShare({ share: 0.1, raiseAfterNotConfirmed: 0.5 }, 3)).toBe(1);
    expect(selectArrivals('s', { share: 0.1, raiseAfterNotConfirmed: 0.5 }, arrivals(50), new Map([['ann', { selected: 1, notConfirmed: 2 }]]))).toHaveLength(50);
  });

  it("selects an interviewer's first complete while they have no back-check, whatever its hash", () => {
    const none = { share: 0, raiseAfterNotConfirmed: 0 };
    const batch = [...arrivals(3, 'ann'), ...arrivals(2, 'bob')];
    const chosen = selectArrivals('s', none, batch, new Map());
    expect(chosen.map((s) => s.interviewId)).toEqual([batch[0]!.interviewId, batch[3]!.interviewId]);
  });

  it('hashes to a number in [0, 1) that depends on seed and id', () => {
    const h = selectionHash('a', 'b');
    expect(h).toBeGreaterThanOrEqual(0);
    expect(h).toBeLessThan(1);
    expect(selectionHash('a', 'c')).not.toBe(h);
  });
});
