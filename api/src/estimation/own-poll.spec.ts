import { describe, expect, it } from 'vitest';
import { EstimationInputError } from './errors.js';
import { effectivePoll } from './own-poll.js';

describe('the project figure as a poll (n* = w(1−w)/SE², k = w·n*)', () => {
  it('gives a simple random sample its own size back', () => {
    // w = 0.4 from 600 interviews without weighting: SE = √(0.4·0.6/600) = 0.02 (binomial, common practice).
    expect(effectivePoll(0.4, Math.sqrt((0.4 * 0.6) / 600))).toEqual({ successes: 240, trials: 600 });
  });

  it('shrinks a weighted sample by its loss of precision, not its raw count', () => {
    // 1,000 interviews with design effect 2: SE² = 0.25·2/1000, so n* = 500 and k = 250.
    expect(effectivePoll(0.5, Math.sqrt(0.5 / 1000))).toEqual({ successes: 250, trials: 500 });
  });

  it('refuses a missing error', () => {
    expect(() => effectivePoll(0.5, 0)).toThrow(EstimationInputError);
    expect(() => effectivePoll(1.2, 0.01)).toThrow(EstimationInputError);
  });
});
