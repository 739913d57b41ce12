import { describe, expect, it } from 'vitest';
import { Coalescer } from './coalesce.js';

/** A computation that returns how many times it has run, finishing when told to. */
function counter() {
  let runs = 0;
  const pending: (() => void)[] = [];
  return {
    compute: () => new Promise<number>((done) => pending.push(() => done(++runs))),
    finishOne: async () => {
      pending.shift()?.();
      await new Promise((r) => setTimeout(r, 0));
    },
    get started() {
      return runs + pending.length;
    },
  };
}

describe('Coalescer', () => {
  it('gives callers who arrive during a run the next run, shared, and never starts two at once', async () => {
    const c = new Coalescer<number>();
    const work = counter();
    const first = c.run('board', work.compute);
    const late = [c.run('board', work.compute), c.run('board', work.compute), c.run('board', work.compute)];
    expect(work.started).toBe(1);
    await work.finishOne();
    expect(await first).toBe(1);
    expect(work.started).toBe(2);
    await work.finishOne();
    expect(await Promise.all(late)).toEqual([2, 2, 2]);
  });

  it('keeps keys apart and starts afresh once a run has ended', async () => {
    const c = new Coalescer<number>();
    const a = counter();
    const b = counter();
    const ra = c.run('a', a.compute);
    const rb = c.run('b', b.compute);
    await a.finishOne();
    await b.finishOne();
    expect([await ra, await rb]).toEqual([1, 1]);
    const again = c.run('a', a.compute);
    await a.finishOne();
    expect(await again).toBe(2);
  });

  it('passes a failure to the callers of that run only; the waiting callers get a fresh run', async () => {
    const c = new Coalescer<number>();
    let fail = true;
    const compute = async () => {
      await new Promise((r) => setTimeout(r, 5));
      if (fail) {
        fail = false;
        throw new Error('database went away');
      }
      return 7;
    };
    const first = c.run('board', compute);
    const waiting = c.run('board', compute);
    await expect(first).rejects.toThrow('database went away');
    expect(await waiting).toBe(7);
  });
});
