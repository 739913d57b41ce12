import { describe, expect, it } from 'vitest';
import { EstimationInputError } from './errors.js';
import { nextInterviews, type EffortQuotaCell } from './next-interviews.js';
import type { MarginTarget, RakingCell } from './raking.js';

// One weighting variable: raking is post-stratification, w_h = P_h·n / n_h, so
// n_eff = (Σw)² / Σw² = 1 / Σ_h (P_h² / n_h) (Kish 1965, Survey Sampling, section 11.7;
// restated in Kish 1992, "Weighting for unequal Pi", JOS 8(2)).
const shares = { A: 0.5, B: 0.3, C: 0.2 } as const;
const age: MarginTarget[] = [{ variable: 'Age', shares: Object.entries(shares).map(([category, share]) => ({ category, share })) }];
const closedForm = (n: Record<string, number>) => 1 / Object.entries(shares).reduce((s, [h, p]) => s + (p * p) / (n[h] as number), 0);
const oneVariable = (n: Record<string, number>): RakingCell[] => Object.entries(n).map(([h, count]) => ({ categories: { Age: h }, count }));
const quota = (n: Record<string, number>, target: Record<string, number>): EffortQuotaCell[] =>
  Object.keys(shares).map((h) => ({ id: h, label: `Age ${h}`, categories: { Age: h }, target: target[h] as number, achieved: n[h] as number }));

describe('where the next interviews help most', () => {
  const n = { A: 40, B: 40, C: 20 };
  const wide = { A: 500, B: 500, C: 500 };

  it('gives the closed-form effective sample size and gain of each cell with one weighting variable', () => {
    const result = nextInterviews(oneVariable(n), age, quota(n, wide), 1);
    expect(result.effectiveSampleSize).toBeCloseTo(closedForm(n), 6);
    for (const g of result.ranking) {
      const after = closedForm({ ...n, [g.id]: n[g.id as keyof typeof n] + 1 });
      expect(g.gain).toBeCloseTo(after - closedForm(n), 6);
    }
    // The best next interview is the argmax of the closed-form gain: here the under-filled A.
    const best = Object.keys(n).reduce((a, b) =>
      closedForm({ ...n, [b]: n[b as keyof typeof n] + 1 }) > closedForm({ ...n, [a]: n[a as keyof typeof n] + 1 }) ? b : a,
    );
    expect(best).toBe('A');
    expect(result.ranking[0]?.id).toBe(best);
    expect(result.plan).toEqual([{ id: best, label: `Age ${best}`, interviews: 1 }]);
  });

  it('builds the greedy plan the closed form builds, one interview at a time', () => {
    const counts: Record<string, number> = { ...n };
    for (let step = 0; step < 30; step++) {
      const pick = Object.keys(counts).reduce((a, b) =>
        closedForm({ ...counts, [b]: (counts[b] as number) + 1 }) > closedForm({ ...counts, [a]: (counts[a] as number) + 1 }) ? b : a,
      );
      counts[pick] = (counts[pick] as number) + 1;
    }
    const result = nextInterviews(oneVariable(n), age, quota(n, wide), 30);
    const planned = Object.fromEntries(result.plan.map((p) => [p.id, p.interviews]));
    for (const h of Object.keys(n)) expect(planned[h] ?? 0).toBe((counts[h] as number) - n[h as keyof typeof n]);
    expect(result.planned).toBe(30);
    expect(result.effectiveSampleSizeAfter).toBeCloseTo(closedForm(counts), 6);
  });

  it('stops at each cell’s target and leaves closed cells out', () => {
    const cells = quota(n, { A: 43, B: 45, C: 25 });
    cells[1] = { ...(cells[1] as EffortQuotaCell), closed: true };
    const result = nextInterviews(oneVariable(n), age, cells, 50);
    expect(result.plan.find((p) => p.id === 'A')?.interviews).toBe(3);
    expect(result.plan.find((p) => p.id === 'B')).toBeUndefined();
    expect(result.plan.find((p) => p.id === 'C')?.interviews).toBe(5);
    expect(result.planned).toBe(8);
  });

  it('lists a cell over target, where one more interview raises the design effect, beside the plan', () => {
    const over = { A: 30, B: 50, C: 20 };
    const result = nextInterviews(oneVariable(over), age, quota(over, { A: 50, B: 30, C: 20 }), 5);
    expect(result.ranking.map((g) => g.id)).toEqual(['A']);
    expect(result.costly.map((g) => g.id)).toContain('B');
    const b = result.costly.find((g) => g.id === 'B');
    // deff = n·Σ_h P_h²/n_h with one variable (the same source as above).
    const deff = (m: Record<string, number>) => Object.values(m).reduce((a, x) => a + x, 0) / closedForm(m);
    expect(b?.designEffectChange).toBeCloseTo(deff({ ...over, B: 51 }) - deff(over), 6);
    expect(b?.designEffectChange).toBeGreaterThan(0);
  });

  it('spreads one more interview in a margin cell over the other variable by the cell’s mix', () => {
    // Age × Sex raked to both margins; a Sex cell's next interview falls over ages as its interviews do.
    const targets: MarginTarget[] = [
      ...age,
      { variable: 'Sex', shares: [{ category: 'F', share: 0.5 }, { category: 'M', share: 0.5 }] },
    ];
    const cells: RakingCell[] = [
      { categories: { Age: 'A', Sex: 'F' }, count: 10 }, { categories: { Age: 'B', Sex: 'F' }, count: 20 },
      { categories: { Age: 'C', Sex: 'F' }, count: 10 }, { categories: { Age: 'A', Sex: 'M' }, count: 30 },
      { categories: { Age: 'B', Sex: 'M' }, count: 20 }, { categories: { Age: 'C', Sex: 'M' }, count: 10 },
    ];
    const sexCell: EffortQuotaCell = { id: 'F', label: 'Female', categories: { Sex: 'F' }, target: 50, achieved: 40 };
    const viaSpread = nextInterviews(cells, targets, [sexCell], 1).ranking[0]?.gain;
    const spread = cells.map((c) => (c.categories.Sex === 'F' ? { ...c, count: c.count * (41 / 40) } : c));
    const byHand = nextInterviews(spread, targets, [], 1).effectiveSampleSize - nextInterviews(cells, targets, [], 1).effectiveSampleSize;
    expect(viaSpread).toBeCloseTo(byHand, 8);
  });

  it('refuses a count that is not a whole number of at least 1 and a quota cell on an unknown variable', () => {
    expect(() => nextInterviews(oneVariable(n), age, quota(n, wide), 0)).toThrow(EstimationInputError);
    expect(() => nextInterviews(oneVariable(n), age, quota(n, wide), 2.5)).toThrow(/whole number/);
    const stray: EffortQuotaCell = { id: 'x', label: 'Region North', categories: { Region: 'North' }, target: 5, achieved: 0 };
    expect(() => nextInterviews(oneVariable(n), age, [stray], 1)).toThrow(/Region is not among/);
  });
});
