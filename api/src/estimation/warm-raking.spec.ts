import { describe, expect, it } from 'vitest';
import { kishDesignEffect } from './design-effect.js';
import { rake, type MarginTarget, type RakingCell } from './raking.js';
import { kish, WarmRaking } from './warm-raking.js';

const targets: MarginTarget[] = [
  { variable: 'age', shares: [{ category: 'young', share: 0.3 }, { category: 'middle', share: 0.4 }, { category: 'old', share: 0.3 }] },
  { variable: 'sex', shares: [{ category: 'f', share: 0.52 }, { category: 'm', share: 0.48 }] },
  { variable: 'region', shares: [{ category: 'N', share: 0.5 }, { category: 'S', share: 0.5 }] },
];
const cells: RakingCell[] = [];
['young', 'middle', 'old'].forEach((age, a) => ['f', 'm'].forEach((sex, s) => ['N', 'S'].forEach((region, r) => {
  cells.push({ categories: { age, sex, region }, count: 3 + ((a * 7 + s * 5 + r * 3) % 11) });
})));

describe('raking a fixed set of cells from a warm start', () => {
  it('gives the weights and Kish figures of rake() (raking.ts), from a cold start or from the weights of other counts', () => {
    const reference = rake(cells, targets, { tolerance: 1e-12, maxIterations: 5000 });
    const counts = Float64Array.from(cells, (c) => c.count);
    const warm = new WarmRaking(cells, targets);
    const cold = warm.weights(counts);
    // A warm start must itself be raked weights (of other counts): raking keeps a start's
    // products of per-category factors, so only such starts reach the weights raked from 1.
    const fromElsewhere = warm.weights(counts, warm.weights(Float64Array.from(cells, (_, j) => 1 + (j % 4))));
    for (const w of [cold, fromElsewhere]) {
      w.forEach((x, j) => expect(x).toBeCloseTo(reference.weights[j] as number, 7));
      const k = kish(counts, w);
      const expected = kishDesignEffect(reference.weights, cells.map((c) => c.count));
      expect(k.effectiveSampleSize).toBeCloseTo(expected.effectiveSampleSize, 6);
      expect(k.designEffect).toBeCloseTo(expected.designEffect, 8);
    }
  });

  it('takes counts that differ from the ones it was built with, cells of count 0 included', () => {
    const counts = Float64Array.from(cells, (c, j) => (j === 0 ? 0 : c.count + (j === 5 ? 0.5 : 0)));
    const moved = cells.map((c, j) => ({ ...c, count: counts[j] as number }));
    const reference = rake(moved, targets, { tolerance: 1e-12, maxIterations: 5000 });
    const w = new WarmRaking(cells, targets).weights(counts);
    w.forEach((x, j) => { if ((counts[j] as number) > 0) expect(x).toBeCloseTo(reference.weights[j] as number, 7); });
  });
});
