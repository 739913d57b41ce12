import { describe, expect, it } from 'vitest';
import { EstimationInputError } from './errors.js';
import { allSourcesDesignEffect, deviationsFromCellMeans, interviewerCorrelation } from './interviewer-correlation.js';
import { benjaminiHochberg, mantelHaenszel } from './mantel-haenszel.js';

describe('mantelHaenszel', () => {
  it('drops strata with fewer than 2 interviews or none by this interviewer, and says how many', () => {
    const result = mantelHaenszel([
      { thisYes: 6, thisNo: 2, otherYes: 10, otherNo: 12 },
      { thisYes: 1, thisNo: 0, otherYes: 0, otherNo: 0 }, // one interview
      { thisYes: 0, thisNo: 0, otherYes: 5, otherNo: 5 }, // none by this interviewer
    ])!;
    expect(result.strataUsed).toBe(1);
    expect(result.strataDropped).toBe(2);
    // One 2 × 2 table by hand: E[a] = 8·16/30, Var[a] = 8·22·16·14/(30²·29).
    const expected = (8 * 16) / 30;
    const variance = (8 * 22 * 16 * 14) / (30 * 30 * 29);
    expect(result.statistic).toBeCloseTo((6 - expected) ** 2 / variance, 12);
  });

  it('has nothing to test when every answer is the same', () => {
    expect(mantelHaenszel([{ thisYes: 4, thisNo: 0, otherYes: 9, otherNo: 0 }])).toBeNull();
    expect(mantelHaenszel([])).toBeNull();
  });

  it('refuses counts that are not whole numbers of 0 or more, naming the stratum', () => {
    expect(() => mantelHaenszel([{ thisYes: -1, thisNo: 0, otherYes: 1, otherNo: 1 }])).toThrow(new EstimationInputError('stratum 1: thisYes must be a whole number of 0 or more, not -1'));
  });
});

describe('benjaminiHochberg', () => {
  it('gives 0.05 for each of 0.01 … 0.05 (p(i)·m/i, running minimum from the top: worked by hand)', () => {
    benjaminiHochberg([0.05, 0.01, 0.03, 0.02, 0.04]).forEach((p) => expect(p).toBeCloseTo(0.05, 15));
  });

  it('keeps the input order, caps at 1, and refuses a p-value outside 0–1', () => {
    expect(benjaminiHochberg([0.9, 0.001])).toEqual([0.9, 0.002]);
    expect(benjaminiHochberg([1, 1])).toEqual([1, 1]);
    expect(() => benjaminiHochberg([0.2, 1.5])).toThrow('p-value 2 must lie between 0 and 1, not 1.5');
  });
});

describe('interviewerCorrelation', () => {
  it('sets a negative estimate to 0, so the interviewer design effect is 1', () => {
    // Every interviewer's mean is the same: MSB = 0 < MSW.
    const result = interviewerCorrelation([[0, 1, 0, 1], [1, 0, 1, 0], [0, 1]])!;
    expect(result.rawRho).toBeLessThan(0);
    expect(result.rho).toBe(0);
    expect(result.designEffect).toBe(1);
  });

  it('gives ρ = 1 and deff = m* when interviewers differ and answers within each agree', () => {
    const result = interviewerCorrelation([[1, 1, 1], [0, 0, 0, 0, 0]])!;
    expect(result.rho).toBeCloseTo(1, 12);
    // m* = (9 + 25) / 8.
    expect(result.designEffect).toBeCloseTo(34 / 8, 12);
  });

  it('needs two interviewers and more interviews than interviewers', () => {
    expect(interviewerCorrelation([[1, 0, 1]])).toBeNull();
    expect(interviewerCorrelation([[1], [0]])).toBeNull();
  });

  it('takes each answer as its deviation from its cell mean', () => {
    const groups = deviationsFromCellMeans([
      { interviewer: 'a', cell: 'x', value: 1 },
      { interviewer: 'b', cell: 'x', value: 0 },
      { interviewer: 'a', cell: 'y', value: 1 },
    ]);
    expect(groups.get('a')).toEqual([0.5, 0]);
    expect(groups.get('b')).toEqual([-0.5]);
  });
});

describe('allSourcesDesignEffect', () => {
  it('multiplies the weighting and interviewer design effects (Gabler, Häder & Lahiri 1999)', () => {
    expect(allSourcesDesignEffect(1.25, 1.2, 600)).toEqual({ designEffect: 1.5, effectiveSampleSize: 400 });
  });
});
