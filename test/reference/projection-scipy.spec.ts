import { describe, expect, it } from 'vitest';
import { pacePredictive, predictiveCdf, predictiveInterval, projectCells } from '../../api/src/estimation/projection.js';
import { runPython } from './tools.js';

const SCIPY = 'scipy.stats (Debian python3-scipy 1.10)';

// The projection's predictive count over D more days after S completes over w days is
// nbinom(n = S, p = w / (w + D)) (docs/methods.md, "Projection to the end of fieldwork").
describe(`projection's predictive count against ${SCIPY} nbinom`, () => {
  const cases = [
    { s: 70, w: 7, d: 10, ks: [80, 100, 120], level: 0.9 },
    { s: 3, w: 7, d: 9, ks: [0, 2, 5], level: 0.9 },
    { s: 412, w: 7, d: 23.5, ks: [1300, 1383, 1500], level: 0.95 },
    { s: 1, w: 5, d: 0.4, ks: [0, 1], level: 0.8 },
  ];
  const reference = JSON.parse(runPython(`
import json
from scipy.stats import nbinom
cases = ${JSON.stringify(cases)}
out = []
for c in cases:
    p = c["w"] / (c["w"] + c["d"]); t = (1 - c["level"]) / 2
    out.append({"mean": nbinom.mean(c["s"], p), "cdf": [nbinom.cdf(k, c["s"], p) for k in c["ks"]],
                "lower": nbinom.ppf(t, c["s"], p), "upper": nbinom.ppf(1 - t, c["s"], p)})
print(json.dumps(out))
`));

  cases.forEach((c, i) => {
    it(`matches mean, P(X ≤ k) and the ${c.level * 100}% interval for ${c.s} completes over ${c.w} days, ${c.d} days left`, () => {
      const d = pacePredictive(c.s, c.w, c.d);
      const ours = predictiveInterval(d, c.level);
      // Reference: scipy.stats.nbinom mean, cdf and ppf (jStat's incomplete beta agrees to about 1e-8).
      expect(Math.abs(ours.expected - reference[i].mean)).toBeLessThan(1e-9 * Math.max(1, reference[i].mean));
      c.ks.forEach((k, j) => expect(Math.abs(predictiveCdf(d, k) - reference[i].cdf[j])).toBeLessThan(1e-7));
      expect([ours.lower, ours.upper]).toEqual([reference[i].lower, reference[i].upper]);
    });
  });

  it('gives a cell its chance of ending below target as scipy does', () => {
    const [cell] = projectCells([{ id: 'x', target: 60, achieved: 41, windowCompletes: 12, closed: false }], 7, 9, 0.9);
    const below = Number(runPython('from scipy.stats import nbinom\nprint(repr(nbinom.cdf(18, 12, 7 / 16)))'));
    // Reference: scipy.stats.nbinom.cdf(need − 1, S, w / (w + D)).
    expect(Math.abs(cell!.probabilityBelowTarget - below)).toBeLessThan(1e-7);
  });
});
