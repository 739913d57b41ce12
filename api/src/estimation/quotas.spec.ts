import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { allocateQuotas, largestRemainder } from './quotas.js';

const variable = (name: string) =>
  fc.array(fc.double({ min: 0, max: 100, noNaN: true }), { minLength: 1, maxLength: 6 })
    .filter((shares) => shares.some((s) => s > 0))
    .map((shares) => ({ variable: name, shares: shares.map((share, i) => ({ category: `${name}${i}`, share })) }));

describe('quota allocation by largest remainder', () => {
  it('sums every set to the total and keeps each cell within one of its exact share', () => {
    fc.assert(
      fc.property(fc.tuple(variable('age'), variable('sex'), variable('region')), fc.integer({ min: 1, max: 5000 }), fc.boolean(),
        (variables, total, interlock) => {
          const allocation = allocateQuotas(variables, total, { interlock: interlock ? ['age', 'sex'] : [] });
          expect(allocation.sets).toHaveLength(interlock ? 2 : 3);
          for (const set of allocation.sets) {
            expect(set.cells.reduce((s, c) => s + c.target, 0)).toBe(total);
            for (const cell of set.cells) {
              expect(Number.isInteger(cell.target)).toBe(true);
              expect(Math.abs(cell.target - cell.expected)).toBeLessThan(1);
            }
          }
        }),
      { numRuns: 300 },
    );
  });

  it('never gives a unit to a smaller remainder while a larger one goes without (Hamilton method)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 50, noNaN: true }), { minLength: 1, maxLength: 12 }), (values) => {
        const sum = values.reduce((a, b) => a + b, 0);
        const total = Math.round(sum);
        const expected = sum > 0 ? values.map((v) => (v * total) / sum) : values.map(() => total / values.length);
        const targets = largestRemainder(expected, total);
        const roundedUp = expected.filter((e, i) => (targets[i] as number) > Math.floor(e)).map((e) => e - Math.floor(e));
        const roundedDown = expected.filter((e, i) => (targets[i] as number) === Math.floor(e)).map((e) => e - Math.floor(e));
        if (roundedUp.length && roundedDown.length) expect(Math.min(...roundedUp)).toBeGreaterThanOrEqual(Math.max(...roundedDown) - 1e-9);
      }),
    );
  });
});
