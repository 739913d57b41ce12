import { describe, expect, it } from 'vitest';
import { betaPosterior } from '../../api/src/estimation/beta-posterior.js';
import { chanceOutlierProbability } from '../../api/src/estimation/beta-binomial.js';
import { plumbline, runPython } from './tools.js';

const SCIPY = 'scipy.stats (Debian python3-scipy 1.10)';

describe(`Beta posterior against ${SCIPY} beta`, () => {
  const cases = [
    { k: 62, n: 100, prior: [1, 1] as const, level: 0.95 },
    { k: 0, n: 25, prior: [0.5, 0.5] as const, level: 0.9 },
    { k: 731, n: 1200, prior: [2, 3] as const, level: 0.99 },
    { k: 3, n: 3, prior: [1, 1] as const, level: 0.8 },
  ];
  const reference = JSON.parse(runPython(`
import json
from scipy.stats import beta
cases = ${JSON.stringify(cases)}
out = []
for c in cases:
    a = c["prior"][0] + c["k"]; b = c["prior"][1] + c["n"] - c["k"]; t = (1 - c["level"]) / 2
    out.append({"mean": beta.mean(a, b), "median": beta.median(a, b), "lower": beta.ppf(t, a, b), "upper": beta.ppf(1 - t, a, b)})
print(json.dumps(out))
`));

  cases.forEach((c, i) => {
    it(`matches mean, median and interval for ${c.k} of ${c.n}, prior Beta(${c.prior}), level ${c.level}`, () => {
      const ours = betaPosterior(c.k, c.n, { prior: c.prior, level: c.level });
      for (const key of ['mean', 'median', 'lower', 'upper'] as const) {
        // Reference: scipy.stats.beta mean/median/ppf.
        expect(Math.abs(ours[key] - reference[i][key])).toBeLessThan(1e-8);
      }
    });
  });
});

describe('Beta posterior: common worked check values (uniform prior)', () => {
  const pct = (x: number, digits = 0) => Number((x * 100).toFixed(digits));

  it('62 of 100: mean just under 62%, 95% interval about 52% to 71%', () => {
    const r = plumbline(['posterior', '--successes', '62', '--trials', '100']).json as Record<string, number>;
    expect(r.mean).toBeLessThan(0.62);
    expect(r.mean).toBeGreaterThan(0.61);
    expect([pct(r.lower as number), pct(r.upper as number)]).toEqual([52, 71]);
  });

  it('620 of 1000: about 59% to 65%', () => {
    const r = plumbline(['posterior', '--successes', '620', '--trials', '1000']).json as Record<string, number>;
    expect([pct(r.lower as number), pct(r.upper as number)]).toEqual([59, 65]);
  });

  it('6200 of 10000: just over 61% to just under 63%', () => {
    const r = plumbline(['posterior', '--successes', '6200', '--trials', '10000']).json as Record<string, number>;
    expect(r.lower).toBeGreaterThan(0.61);
    expect(r.lower).toBeLessThan(0.611);
    expect(r.upper).toBeLessThan(0.63);
    expect(r.upper).toBeGreaterThan(0.629);
  });
});

describe(`chance-outlier probability against ${SCIPY} betabinom`, () => {
  const cases = [
    // 62% of 1000 given two unbiased polls of 1000 at 50% and 49%.
    { k: 620, n: 1000, others: { successes: 990, trials: 2000 } },
    { k: 455, n: 800, others: { successes: 1490, trials: 3000 } },
    { k: 52, n: 100, others: { successes: 500, trials: 1000 } },
    { k: 3, n: 40, others: { successes: 60, trials: 300 } },
  ];
  const reference = JSON.parse(runPython(`
import json
import numpy as np
from scipy.stats import betabinom
cases = ${JSON.stringify(cases)}
out = []
for c in cases:
    a = 1 + c["others"]["successes"]; b = 1 + c["others"]["trials"] - c["others"]["successes"]; n = c["n"]; k = c["k"]
    mean = n * a / (a + b)
    ks = np.arange(k, n + 1) if k >= mean else np.arange(0, k + 1)
    out.append(float(betabinom.pmf(ks, n, a, b).sum()))
print(json.dumps(out))
`));

  cases.forEach((c, i) => {
    it(`matches the one-sided predictive tail for ${c.k} of ${c.n}`, () => {
      const ours = chanceOutlierProbability({ successes: c.k, trials: c.n }, c.others);
      // Reference: sum of scipy.stats.betabinom.pmf over the tail on the observed side.
      expect(Math.abs(ours / reference[i] - 1)).toBeLessThan(1e-6);
    });
  });

  it('puts 62% of 1000 far below the approximate figure of about 4 in 10 million', () => {
    const ours = chanceOutlierProbability({ successes: 620, trials: 1000 }, { successes: 990, trials: 2000 });
    // Common worked example: an approximate tool gives about 4e-7; the exact beta-binomial value is far smaller.
    expect(ours).toBeLessThan(4e-7 / 100);
    expect(Math.abs(ours / reference[0] - 1)).toBeLessThan(1e-6);
  });
});
