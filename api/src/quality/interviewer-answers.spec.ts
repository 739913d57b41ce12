import { describe, expect, it } from 'vitest';
import { mantelHaenszel } from '../estimation/mantel-haenszel.js';
import { interviewerAnswerTests, type AnsweredComplete } from './interviewer-answers.js';
import { DEFAULT_QUALITY_SETTINGS } from './quality-settings.js';

function completes(interviewerId: string, stratum: string, yes: number, no: number): AnsweredComplete[] {
  return [...Array(yes).fill(true), ...Array(no).fill(false)].map((answer: boolean) => ({ interviewerId, stratum, yes: answer }));
}

describe('interviewer answers', () => {
  const data = [
    ...completes('lean', 'x', 18, 2), ...completes('lean', 'y', 9, 1),
    ...completes('even', 'x', 10, 10), ...completes('even', 'y', 5, 10),
    ...completes('other', 'x', 11, 11), ...completes('other', 'y', 6, 9),
    ...completes('third', 'x', 13, 9), ...completes('third', 'y', 7, 8),
    ...completes('fourth', 'x', 12, 10), ...completes('fourth', 'y', 6, 9),
    ...completes('new', 'x', 3, 3),
  ];
  const results = interviewerAnswerTests(data, DEFAULT_QUALITY_SETTINGS.interviewerAnswers);
  const of = (id: string) => results.find((r) => r.interviewerId === id)!;

  it('tests interviewers with at least 20 completes against everyone else, by stratum', () => {
    const direct = mantelHaenszel([
      { thisYes: 18, thisNo: 2, otherYes: 49, otherNo: 43 },
      { thisYes: 9, thisNo: 1, otherYes: 24, otherNo: 36 },
    ])!;
    expect(of('lean').pValue).toBeCloseTo(direct.pValue, 15);
    expect(of('new')).toMatchObject({ flagged: false, pValue: null, reason: 'Not tested: 6 completes, fewer than 20' });
  });

  it('flags the interviewer whose adjusted p-value is under the false discovery rate, and says why in words', () => {
    expect(of('lean').flagged).toBe(true);
    expect(results.filter((r) => r.flagged).map((r) => r.interviewerId)).toEqual(['lean']);
    expect(of('lean').reason).toMatch(/^90% yes where the others' answers in the same cells give \d+(\.\d)?%; p = .+, below 0\.1 after adjusting for 5 interviewers tested/);
  });
});
