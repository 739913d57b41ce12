import { sampleVariance, mean } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { kishDesignEffect } from '../../api/src/estimation/design-effect.js';

describe('Kish design effect of weighting', () => {
  it('equals 1 + L, L the relvariance of the weights (Kish 1992, "Weighting for unequal Pi", JOS 8(2))', () => {
    const weights = [0.4, 0.4, 0.9, 1.1, 1.1, 1.1, 2.5, 0.6, 1.3, 0.7];
    const n = weights.length;
    // Relvariance with the population (divide-by-n) variance, from simple-statistics.
    const relvariance = (sampleVariance(weights) * (n - 1)) / n / mean(weights) ** 2;
    expect(kishDesignEffect(weights).designEffect).toBeCloseTo(1 + relvariance, 12);
  });

  it('gives deff 1.25 and n_eff 80 for 100 interviews, half weighted 1 and half 3 (worked by hand)', () => {
    // By hand: mean 2, variance 1, L = 1/4, deff = 1.25, n_eff = 100 / 1.25 = 80.
    const result = kishDesignEffect([1, 3], [50, 50]);
    expect(result.n).toBe(100);
    expect(result.designEffect).toBeCloseTo(1.25, 12);
    expect(result.effectiveSampleSize).toBeCloseTo(80, 10);
  });

  it('gives the same answer on aggregated cells as on the rows they stand for', () => {
    const rows = [...Array(30).fill(0.5), ...Array(20).fill(1.75)];
    expect(kishDesignEffect([0.5, 1.75], [30, 20]).designEffect).toBeCloseTo(kishDesignEffect(rows).designEffect, 12);
  });
});
