import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { kishDesignEffect } from './design-effect.js';
import { rake, type MarginTarget, type RakingCell } from './raking.js';

/** Every combination of the categories, each with at least one interview: raking to any positive targets is then feasible. */
const problem = fc
  .array(fc.integer({ min: 2, max: 4 }), { minLength: 2, maxLength: 4 })
  .chain((sizes) => {
    const combos = sizes.reduce<number[][]>((acc, size) => acc.flatMap((c) => Array.from({ length: size }, (_, i) => [...c, i])), [[]]);
    return fc.record({
      sizes: fc.constant(sizes),
      counts: fc.array(fc.integer({ min: 1, max: 60 }), { minLength: combos.length, maxLength: combos.length }),
      shares: fc.tuple(...sizes.map((s) => fc.array(fc.double({ min: 0.05, max: 1, noNaN: true }), { minLength: s, maxLength: s }))),
      combos: fc.constant(combos),
    });
  });

function build(p: { sizes: number[]; counts: number[]; shares: number[][]; combos: number[][] }) {
  const cells: RakingCell[] = p.combos.map((combo, j) => ({
    categories: Object.fromEntries(combo.map((c, v) => [`v${v}`, `c${c}`])),
    count: p.counts[j] as number,
  }));
  const targets: MarginTarget[] = p.sizes.map((_, v) => ({
    variable: `v${v}`,
    shares: (p.shares[v] as number[]).map((share, c) => ({ category: `c${c}`, share })),
  }));
  return { cells, targets };
}

describe('raking on random feasible inputs', () => {
  it('meets every margin within the tolerance, with positive weights of mean 1 and a design effect of at least 1', () => {
    fc.assert(
      fc.property(problem, (p) => {
        const { cells, targets } = build(p);
        const result = rake(cells, targets, { tolerance: 1e-8, maxIterations: 5000 });
        expect(result.converged).toBe(true);
        for (const m of result.margins) expect(Math.abs(m.weighted - m.target)).toBeLessThanOrEqual(1e-8);
        expect(result.weights.every((w) => w > 0)).toBe(true);
        const n = cells.reduce((s, c) => s + c.count, 0);
        const mean = result.weights.reduce((s, w, j) => s + w * (cells[j] as RakingCell).count, 0) / n;
        expect(mean).toBeCloseTo(1, 10);
        expect(kishDesignEffect(result.weights, cells.map((c) => c.count)).designEffect).toBeGreaterThanOrEqual(1 - 1e-12);
      }),
      { numRuns: 150 },
    );
  });

  it('keeps weights within a cap and floor whenever some weights within them meet the targets', () => {
    fc.assert(
      fc.property(problem, fc.array(fc.double({ min: 0.5, max: 2, noNaN: true }), { minLength: 256, maxLength: 256 }), (p, seedWeights) => {
        const { cells } = build(p);
        // Targets are the margins of weights known to lie in [0.5, 2] relative to their mean, so the bounds are feasible.
        const n = cells.reduce((s, c) => s + c.count, 0);
        const raw = cells.map((_, j) => seedWeights[j % seedWeights.length] as number);
        const mean = raw.reduce((s, w, j) => s + w * (cells[j] as RakingCell).count, 0) / n;
        const cap = Math.max(...raw) / mean;
        const floor = Math.min(...raw) / mean;
        const targets: MarginTarget[] = p.sizes.map((size, v) => ({
          variable: `v${v}`,
          shares: Array.from({ length: size }, (_, c) => ({
            category: `c${c}`,
            share: cells.reduce((s, cell, j) => (cell.categories[`v${v}`] === `c${c}` ? s + cell.count * (raw[j] as number) : s), 0),
          })),
        }));
        const result = rake(cells, targets, { tolerance: 1e-7, maxIterations: 20000, cap: cap * 1.0001, floor: floor / 1.0001 });
        expect(result.converged).toBe(true);
        for (const w of result.weights) {
          expect(w).toBeLessThanOrEqual(cap * 1.0001 + 1e-9);
          expect(w).toBeGreaterThanOrEqual(floor / 1.0001 - 1e-9);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('gives the same weights for rows as for the cells they are counted into', () => {
    const cells = [
      { categories: { a: 'x', b: 'p' }, count: 3 },
      { categories: { a: 'y', b: 'p' }, count: 1 },
      { categories: { a: 'x', b: 'q' }, count: 2 },
      { categories: { a: 'y', b: 'q' }, count: 4 },
    ];
    const rows = cells.flatMap((c) => Array.from({ length: c.count }, () => ({ categories: c.categories, count: 1 })));
    const targets = [
      { variable: 'a', shares: [{ category: 'x', share: 0.3 }, { category: 'y', share: 0.7 }] },
      { variable: 'b', shares: [{ category: 'p', share: 0.6 }, { category: 'q', share: 0.4 }] },
    ];
    const byCell = rake(cells, targets, { tolerance: 1e-12 }).weights;
    const byRow = rake(rows, targets, { tolerance: 1e-12 }).weights;
    const expanded = cells.flatMap((c, j) => Array.from({ length: c.count }, () => byCell[j] as number));
    expanded.forEach((w, i) => expect(w).toBeCloseTo(byRow[i] as number, 12));
  });
});
