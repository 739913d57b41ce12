import { describe, expect, it } from 'vitest';
import { allSourcesDesignEffect, deviationsFromCellMeans, interviewerCorrelation } from '../estimation/interviewer-correlation.js';
import { answerRows, interviewerEffect } from './interviewer-effect.js';

// The balance reads counts per interviewer and weighting cell; the figure must be the pure
// functions' (checked against R's aov in test/reference/interviewer-checks-r.spec.ts) on the
// same answers written out one per interview.
const counts = [
  { interviewer: 'a', cell: 'young', yes: 4, answered: 5 },
  { interviewer: 'a', cell: 'old', yes: 1, answered: 3 },
  { interviewer: 'b', cell: 'young', yes: 1, answered: 4 },
  { interviewer: 'b', cell: 'old', yes: 0, answered: 2 },
  { interviewer: 'c', cell: 'young', yes: 2, answered: 2 },
  { interviewer: 'c', cell: 'old', yes: 2, answered: 4 },
];

describe('the interviewers’ effect from grouped counts', () => {
  it('writes each answered complete out once: yes 1, no 0', () => {
    const rows = answerRows(counts);
    expect(rows).toHaveLength(20);
    expect(rows.filter((r) => r.interviewer === 'a' && r.cell === 'old').map((r) => r.value)).toEqual([1, 0, 0]);
  });

  it('equals the pure functions on the same answers, and all sources is Kish × the interviewer design effect', () => {
    const byHand = [
      ...[1, 1, 1, 1, 0].map((value) => ({ interviewer: 'a', cell: 'young', value })),
      ...[1, 0, 0].map((value) => ({ interviewer: 'a', cell: 'old', value })),
      ...[1, 0, 0, 0].map((value) => ({ interviewer: 'b', cell: 'young', value })),
      ...[0, 0].map((value) => ({ interviewer: 'b', cell: 'old', value })),
      ...[1, 1].map((value) => ({ interviewer: 'c', cell: 'young', value })),
      ...[1, 1, 0, 0].map((value) => ({ interviewer: 'c', cell: 'old', value })),
    ];
    const expected = interviewerCorrelation([...deviationsFromCellMeans(byHand).values()])!;
    const effect = interviewerEffect(counts, 1.3, 25)!;
    expect(effect.rawRho).toBeCloseTo(expected.rawRho, 12);
    expect(effect.designEffect).toBeCloseTo(expected.designEffect, 12);
    expect(effect.allSourcesDesignEffect).toBeCloseTo(1.3 * expected.designEffect, 12);
    expect(effect.allSourcesEffectiveSampleSize).toBeCloseTo(allSourcesDesignEffect(1.3, expected.designEffect, 25).effectiveSampleSize, 12);
  });

  it('gives the interviewer figures without weights, and nothing for a single interviewer', () => {
    expect(interviewerEffect(counts, null, 25)).toMatchObject({ allSourcesDesignEffect: null, allSourcesEffectiveSampleSize: null, interviewers: 3 });
    expect(interviewerEffect(counts.filter((c) => c.interviewer === 'a'), 1.3, 8)).toBeNull();
  });
});
