import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { betaBinomialLogPmf, betaBinomialTail } from './beta-binomial.js';
import { betaPosterior } from './beta-posterior.js';
import { applyBiasFactor } from './bias-factor.js';
import { kishDesignEffect } from './design-effect.js';
import { outcomeRates } from './outcome-rates.js';
import { reconcile } from './reconcile.js';
import { summariseWeighting } from './weighting-summary.js';

describe('properties a user relies on', () => {
  it('design effect is at least 1 for any weights', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.double({ min: 0.01, max: 50, noNaN: true }), fc.integer({ min: 1, max: 100 })), { minLength: 1, maxLength: 40 }), (pairs) => {
        const d = kishDesignEffect(pairs.map((p) => p[0]), pairs.map((p) => p[1]));
        expect(d.designEffect).toBeGreaterThanOrEqual(1 - 1e-12);
        expect(d.effectiveSampleSize).toBeLessThanOrEqual(d.n + 1e-9);
      }),
    );
  });

  it('a single unbiased group reconciles to the conjugate Beta posterior (jstat)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 1, max: 3000 }), fc.double({ min: 0, max: 1, noNaN: true })), { minLength: 1, maxLength: 4 }), (polls) => {
        const list = polls.map(([n, f], i) => ({ id: `p${i}`, group: 'g', trials: n, successes: Math.round(n * f) }));
        const k = list.reduce((s, p) => s + p.successes, 0);
        const n = list.reduce((s, p) => s + p.trials, 0);
        const ours = reconcile({ groups: [{ id: 'g', bias: { kind: 'none' } }], polls: list }).truth;
        const conjugate = betaPosterior(k, n);
        for (const key of ['mean', 'median', 'lower', 'upper'] as const) expect(Math.abs(ours[key] - conjugate[key])).toBeLessThan(1e-4);
      }),
      { numRuns: 25 },
    );
  });

  it('the implied bias factor is 0.5 when weighting does not move the share, and above 0.5 when the sample overstates', () => {
    const sex = (female: number) => [{ variable: 'sex', shares: [{ category: 'f', share: female }, { category: 'm', share: 1 - female }] }];
    const cells = [{ categories: { sex: 'f' }, count: 100, successes: 60 }, { categories: { sex: 'm' }, count: 100, successes: 30 }];
    // The sample's own mix as the target: weights stay 1, so u = w and b = 0.5.
    const even = summariseWeighting(cells, sex(0.5)).outcome!;
    expect(even.impliedBiasFactor).toBeCloseTo(0.5, 12);
    // Women, who answer yes more often, are over-represented against a 30% target: the raw sample overstates.
    const over = summariseWeighting(cells, sex(0.3)).outcome!;
    expect(over.impliedBiasFactor as number).toBeGreaterThan(0.5);
    const [lower, upper] = over.impliedBiasFactorInterval as [number, number];
    expect(lower).toBeLessThan(over.impliedBiasFactor as number);
    expect(upper).toBeGreaterThan(over.impliedBiasFactor as number);
    expect(lower).toBeGreaterThan(0.5);
  });

  it('a bias factor of b turns a true 50/50 split into a report of b, and 0.5 changes nothing', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 0.99, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (p, b) => {
        expect(applyBiasFactor(0.5, b)).toBeCloseTo(b, 12);
        expect(applyBiasFactor(p, 0.5)).toBeCloseTo(p, 12);
      }),
    );
  });

  it('the two beta-binomial tails overlap in exactly the observed value', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 400 }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0.5, max: 300, noNaN: true }), fc.double({ min: 0.5, max: 300, noNaN: true }),
        (n, f, a, b) => {
          const k = Math.round(n * f);
          const both = betaBinomialTail(k, n, a, b, true) + betaBinomialTail(k, n, a, b, false);
          expect(both).toBeCloseTo(1 + Math.exp(betaBinomialLogPmf(k, n, a, b)), 9);
        }),
    );
  });

  it('outcome rates keep the orderings their definitions imply (RR1 ≤ RR3 ≤ RR5, RR1 ≤ RR2, COOP1 ≤ COOP3)', () => {
    const count = fc.integer({ min: 0, max: 500 });
    fc.assert(
      fc.property(fc.record({ I: fc.integer({ min: 1, max: 500 }), P: count, R: count, NC: count, O: count, UH: count, UO: count, NE: count }), (c) => {
        const r = outcomeRates(c);
        expect(r.RR1 as number).toBeLessThanOrEqual((r.RR3 as number) + 1e-12);
        expect(r.RR3 as number).toBeLessThanOrEqual((r.RR5 as number) + 1e-12);
        expect(r.RR1 as number).toBeLessThanOrEqual((r.RR2 as number) + 1e-12);
        expect(r.COOP1 as number).toBeLessThanOrEqual((r.COOP3 as number) + 1e-12);
        expect(r.e).toBeGreaterThanOrEqual(0);
        expect(r.e).toBeLessThanOrEqual(1);
      }),
    );
  });
});
