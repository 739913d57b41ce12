import { describe, expect, it } from 'vitest';
import { EstimationInputError } from './errors.js';
import { pacePredictive, predictiveCdf, predictiveInterval, projectCells, projectTotal } from './projection.js';

// Cases built so the answer is known exactly (docs/methods.md, "Projection to the end of fieldwork").
describe('projectTotal', () => {
  it('at a constant pace of 10 a day, 20 days more bring 200 more', () => {
    const r = projectTotal({ completes: 200, windowCompletes: 70, windowDays: 7, remainingDays: 20, target: 300, level: 0.9 });
    expect(r.pacePerDay).toBe(10);
    expect(r.atEnd?.expected).toBeCloseTo(400, 10);
    expect(r.atEnd!.lower).toBeLessThan(400);
    expect(r.atEnd!.upper).toBeGreaterThan(400);
    // 100 still needed at 10 a day: 10 days, with the interval around it.
    expect(r.daysToTarget?.expected).toBe(10);
    expect(r.daysToTarget!.earliest).toBeLessThanOrEqual(10);
    expect(r.daysToTarget!.latest).toBeGreaterThan(10);
  });

  it('with one complete a day seen over one day, the first complete comes by day 1 at 5% and day 19 at 95%', () => {
    // Size 1, p = 1/(1+d): P(at least one in d days) = d/(1+d); ≥ 0.05 first at d = 1, ≥ 0.95 first at d = 19.
    const r = projectTotal({ completes: 9, windowCompletes: 1, windowDays: 1, remainingDays: null, target: 10, level: 0.9 });
    expect(r.daysToTarget).toEqual({ expected: 1, earliest: 1, latest: 19 });
    expect(r.atEnd).toBeNull();
    expect(r.probabilityBelowTarget).toBeNull();
  });

  it('on the last day the total at the end is the total now, with no spread', () => {
    const r = projectTotal({ completes: 480, windowCompletes: 70, windowDays: 7, remainingDays: 0, target: 500, level: 0.9 });
    expect(r.atEnd).toEqual({ expected: 480, lower: 480, upper: 480 });
    expect(r.probabilityBelowTarget).toBe(1);
  });

  it('a target already reached is reached today and cannot end below', () => {
    const r = projectTotal({ completes: 500, windowCompletes: 0, windowDays: 7, remainingDays: 3, target: 500, level: 0.9 });
    expect(r.daysToTarget).toEqual({ expected: 0, earliest: 0, latest: 0 });
    expect(r.probabilityBelowTarget).toBe(0);
  });

  it('with no completes over the window there is no date for the target', () => {
    const r = projectTotal({ completes: 10, windowCompletes: 0, windowDays: 7, remainingDays: 5, target: 500, level: 0.9 });
    expect(r.daysToTarget).toBeNull();
    expect(r.atEnd).toEqual({ expected: 10, lower: 10, upper: 10 });
  });

  it('refuses a window of no days and a level outside (0, 1)', () => {
    expect(() => projectTotal({ completes: 1, windowCompletes: 1, windowDays: 0, remainingDays: 1, target: 5, level: 0.9 })).toThrow(EstimationInputError);
    expect(() => projectTotal({ completes: 1, windowCompletes: 1, windowDays: 7, remainingDays: 1, target: 5, level: 1 })).toThrow(EstimationInputError);
  });
});

describe('projectCells', () => {
  it('a cell with one complete a week and a week left is geometric: 2 short ends below with probability 3/4', () => {
    // Size 1, p = 7/(7+7) = 1/2: P(X ≤ k) = 1 − 2^−(k+1); P(X ≤ 1) = 3/4; 95% quantile k = 4.
    const [c] = projectCells([{ id: 'a', target: 12, achieved: 10, windowCompletes: 1, closed: false }], 7, 7, 0.9);
    expect(c).toMatchObject({ id: 'a', pacePerDay: 1 / 7, lower: 10, upper: 14, atRisk: true });
    expect(c!.expected).toBeCloseTo(11, 12);
    expect(c!.probabilityBelowTarget).toBeCloseTo(0.75, 12);
  });

  it('a cell with no completes over the window cannot fill: it ends where it is, surely below target', () => {
    const [c] = projectCells([{ id: 'b', target: 10, achieved: 3, windowCompletes: 0, closed: false }], 7, 5, 0.9);
    expect(c).toEqual({ id: 'b', pacePerDay: 0, expected: 3, lower: 3, upper: 3, probabilityBelowTarget: 1, atRisk: true });
  });

  it('a closed cell takes no more, whatever its pace; a full cell is not at risk', () => {
    const [closed, full] = projectCells(
      [
        { id: 'c', target: 10, achieved: 4, windowCompletes: 30, closed: true },
        { id: 'd', target: 10, achieved: 10, windowCompletes: 0, closed: false },
      ],
      7,
      5,
      0.9,
    );
    expect(closed).toMatchObject({ expected: 4, probabilityBelowTarget: 1, atRisk: true });
    expect(full).toMatchObject({ expected: 10, probabilityBelowTarget: 0, atRisk: false });
  });
});

describe('the predictive count', () => {
  it('keeps the pace as its mean and is wider than Poisson by the factor 1 + D/w', () => {
    const d = pacePredictive(70, 7, 14);
    const { expected } = predictiveInterval(d, 0.9);
    expect(expected).toBeCloseTo(140, 10);
    // Variance of NB(r, p) is r(1−p)/p²; here 140 × (1 + 14/7) = 420.
    expect((d.size * (1 - d.p)) / d.p ** 2).toBeCloseTo(420, 9);
  });

  it('is a distribution: P(X ≤ k) rises to 1', () => {
    const d = pacePredictive(20, 7, 3);
    expect(predictiveCdf(d, -1)).toBe(0);
    expect(predictiveCdf(d, 5)).toBeLessThan(predictiveCdf(d, 10));
    expect(predictiveCdf(d, 1000)).toBeCloseTo(1, 12);
  });
});
