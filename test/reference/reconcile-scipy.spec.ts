import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { reconcile, type ReconcileInput } from '../../api/src/estimation/reconcile.js';
import { plumbline, runPython, tempDir } from './tools.js';

/**
 * Reference: the same model integrated with scipy.integrate.quad (adaptive Gauss-Kronrod,
 * QUADPACK) and scipy.optimize.brentq for the quantiles, in Debian's python3-scipy 1.10.
 * Unknown-bias groups are integrated in an inner quad over b.
 */
const SCIPY_RECONCILE = `
import json, math
from functools import lru_cache
import numpy as np
from scipy import integrate, optimize, special, stats

spec = json.load(open("input.json"))
a0, b0 = spec.get("prior", [1, 1])
groups = {g["id"]: g["bias"] for g in spec["groups"]}
pooled = {}
for x in spec["polls"]:
    k, n = pooled.get(x["group"], (0, 0))
    pooled[x["group"]] = (k + x["successes"], n + x["trials"])
logit = lambda x: math.log(x / (1 - x))
expit = lambda x: 1 / (1 + math.exp(-x))

def beta_pdf(x, a, b):
    # Same value as scipy.stats.beta.pdf, without its per-call overhead inside nested quad.
    return math.exp((a - 1) * math.log(x) + (b - 1) * math.log1p(-x) - special.betaln(a, b))

def beta_params(bias):
    m = bias.get("mean", 0.5); s = bias.get("spread", 0.04)
    nu = m * (1 - m) / s ** 2 - 1
    return m * nu, (1 - m) * nu

def group_lik(gid, p, b):
    # Product of the group's binomial likelihoods (constants dropped): all its polls report q(p, b).
    k, n = pooled.get(gid, (0, 0))
    q = expit(logit(p) + logit(b))
    return math.exp(k * math.log(q) + (n - k) * math.log1p(-q) - LOGMAX.get(gid, 0.0))

LOGMAX = {gid: (k * math.log(k / n) + (n - k) * math.log1p(-k / n) if 0 < k < n else 0.0) for gid, (k, n) in pooled.items()}

@lru_cache(maxsize=None)
def group_factor(gid, p):
    bias = groups[gid]
    if bias["kind"] == "none":
        return group_lik(gid, p, 0.5)
    if bias["kind"] == "known":
        return group_lik(gid, p, bias["factor"])
    al, be = beta_params(bias)
    lo, hi = stats.beta.ppf([1e-12, 1 - 1e-12], al, be)
    return integrate.quad(lambda b: beta_pdf(b, al, be) * group_lik(gid, p, b), lo, hi, limit=200, epsabs=0, epsrel=1e-10)[0]

@lru_cache(maxsize=None)
def post(p, skip=None):
    v = beta_pdf(p, a0, b0)
    for gid in groups:
        if gid != skip:
            v *= group_factor(gid, p)
    return v

# Locate the mass, then integrate over a window that holds all of it.
grid = np.linspace(0.002, 0.998, 250)
vals = np.array([post(float(p)) for p in grid])
live = grid[vals > vals.max() * 1e-14]
lo, hi = max(1e-9, live.min() - 0.004), min(1 - 1e-9, live.max() + 0.004)
opts = dict(limit=200, epsabs=0, epsrel=1e-11)
Z = integrate.quad(post, lo, hi, **opts)[0]
cdf = lambda x: integrate.quad(post, lo, x, **opts)[0] / Z
level = 0.95
out = {
    "mean": integrate.quad(lambda p: p * post(p), lo, hi, **opts)[0] / Z,
    "median": optimize.brentq(lambda x: cdf(x) - 0.5, lo, hi, xtol=1e-12),
    "lower": optimize.brentq(lambda x: cdf(x) - (1 - level) / 2, lo, hi, xtol=1e-12),
    "upper": optimize.brentq(lambda x: cdf(x) - (1 + level) / 2, lo, hi, xtol=1e-12),
    "groups": {},
}
for gid, bias in groups.items():
    if bias["kind"] != "unknown":
        continue
    al, be = beta_params(bias)
    blo, bhi = stats.beta.ppf([1e-12, 1 - 1e-12], al, be)
    inner = lru_cache(maxsize=None)(lambda b: beta_pdf(b, al, be) * integrate.quad(
        lambda p: post(p, gid) * group_lik(gid, p, b), lo, hi, limit=200, epsabs=0, epsrel=1e-10)[0])
    bgrid = np.linspace(blo, bhi, 80)
    bvals = np.array([inner(float(b)) for b in bgrid])
    live = bgrid[bvals > bvals.max() * 1e-14]
    step = bgrid[1] - bgrid[0]
    l2, h2 = max(blo, live.min() - step), min(bhi, live.max() + step)
    Zb = integrate.quad(inner, l2, h2, limit=200, epsabs=0, epsrel=1e-9)[0]
    above = integrate.quad(inner, max(0.5, l2), h2, limit=200, epsabs=0, epsrel=1e-9)[0] / Zb if h2 > 0.5 else 0.0
    out["groups"][gid] = {
        "meanFactor": integrate.quad(lambda b: b * inner(b), l2, h2, limit=200, epsabs=0, epsrel=1e-9)[0] / Zb,
        "probOverstates": above,
    }
print(json.dumps(out))
`;

function scipyReference(input: ReconcileInput) {
  const dir = tempDir();
  writeFileSync(join(dir, 'input.json'), JSON.stringify(input));
  return JSON.parse(runPython(SCIPY_RECONCILE, dir));
}

const twoUnbiased = [
  { id: 'north-1', group: 'phone', successes: 500, trials: 1000 },
  { id: 'north-2', group: 'phone', successes: 490, trials: 1000 },
];

describe('reconciliation against scipy quadrature', () => {
  it('two unbiased polls of 1000 at 50% and 49%: the conjugate Beta(991, 1011), mean 49.5%, interval 47.3% to 51.7%', () => {
    const input: ReconcileInput = { groups: [{ id: 'phone', bias: { kind: 'none' } }], polls: twoUnbiased };
    const ours = reconcile(input);
    const ref = scipyReference(input);
    for (const key of ['mean', 'median', 'lower', 'upper'] as const) {
      // Reference: scipy.integrate.quad of the same posterior; accuracy promised: 1e-4.
      expect(Math.abs(ours.truth[key] - ref[key])).toBeLessThan(1e-4);
    }
    // Common worked example: mean 49.5%, 95% interval 47.3% to 51.7%.
    expect((ours.truth.mean * 100).toFixed(1)).toBe('49.5');
    expect([(ours.truth.lower * 100).toFixed(1), (ours.truth.upper * 100).toFixed(1)]).toEqual(['47.3', '51.7']);
  });

  it('those two as a group of known bias factor 0.48 plus an unbiased 62% of 1000: near 55%, about 53% to 57%', () => {
    const input: ReconcileInput = {
      groups: [{ id: 'phone', bias: { kind: 'known', factor: 0.48 } }, { id: 'door', bias: { kind: 'none' } }],
      polls: [...twoUnbiased, { id: 'door-1', group: 'door', successes: 620, trials: 1000 }],
    };
    const ours = reconcile(input);
    const ref = scipyReference(input);
    for (const key of ['mean', 'median', 'lower', 'upper'] as const) {
      // Reference: scipy.integrate.quad of the same posterior.
      expect(Math.abs(ours.truth[key] - ref[key])).toBeLessThan(1e-4);
    }
    // Common worked example: near 55%, interval about 53% to 57%.
    expect(Math.round(ours.truth.mean * 100)).toBe(55);
    expect([Math.round(ours.truth.lower * 100), Math.round(ours.truth.upper * 100)]).toEqual([53, 57]);
  });

  it('a group of unknown bias (default spread 0.04): truth, mean factor and chance it overstates', () => {
    const input: ReconcileInput = {
      groups: [{ id: 'phone', bias: { kind: 'unknown' } }, { id: 'door', bias: { kind: 'none' } }, { id: 'web', bias: { kind: 'unknown', mean: 0.55, spread: 0.06 } }],
      polls: [
        ...twoUnbiased,
        { id: 'door-1', group: 'door', successes: 620, trials: 1000 },
        { id: 'web-1', group: 'web', successes: 330, trials: 500 },
      ],
    };
    const ours = reconcile(input);
    const ref = scipyReference(input);
    for (const key of ['mean', 'median', 'lower', 'upper'] as const) {
      // Reference: scipy.integrate.quad with an inner quad over each unknown bias factor.
      expect(Math.abs(ours.truth[key] - ref[key])).toBeLessThan(1e-4);
    }
    for (const id of ['phone', 'web']) {
      const group = ours.groups.find((g) => g.id === id);
      // Reference: the marginal posterior of b by nested scipy.integrate.quad.
      expect(Math.abs((group?.meanFactor as number) - ref.groups[id].meanFactor)).toBeLessThan(1e-4);
      expect(Math.abs((group?.probOverstates as number) - ref.groups[id].probOverstates)).toBeLessThan(1e-4);
    }
  });

  it('gives identical results on every run (no random sampling)', () => {
    const input: ReconcileInput = {
      groups: [{ id: 'phone', bias: { kind: 'unknown' } }, { id: 'door', bias: { kind: 'none' } }],
      polls: [...twoUnbiased, { id: 'door-1', group: 'door', successes: 620, trials: 1000 }],
    };
    const dir = tempDir();
    writeFileSync(join(dir, 'input.json'), JSON.stringify(input));
    const first = plumbline(['reconcile', '--input', join(dir, 'input.json')]);
    const second = plumbline(['reconcile', '--input', join(dir, 'input.json')]);
    expect(first.code).toBe(0);
    expect(second.stdout).toBe(first.stdout);
  });
});
