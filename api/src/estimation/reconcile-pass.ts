// One pass of the reconciliation's quadrature (estimation/reconcile.ts): the posterior of the
// true share on a grid in logit p and each unknown group's bias-factor marginal on its own grid.
import { linspace, logSigmoid } from './grid.js';

export interface GroupModel {
  id: string;
  /** Pooled successes and trials: every poll in a group reports the same q(p, b). */
  k: number;
  n: number;
  /** logit(b) when fixed (none or known), else null. */
  fixedLogit: number | null;
  /** Beta(α, β) parameters of b when unknown. */
  alpha: number;
  beta: number;
}

export interface PassResult {
  xs: Float64Array;
  logPost: Float64Array;
  bMarginals: { grid: Float64Array; logDensity: Float64Array }[];
}

/** Log density of logit(v) when v ~ Beta(a, b), up to a constant. */
const logitBetaLogDensity = (t: number, a: number, b: number): number => a * logSigmoid(t) + b * logSigmoid(-t);

const groupLogLik = (m: GroupModel, eta: number): number => m.k * logSigmoid(eta) + (m.n - m.k) * logSigmoid(-eta);

export function runPass(
  prior: readonly [number, number], models: GroupModel[], unknown: GroupModel[],
  xRange: [number, number], bRanges: [number, number][], nx: number, nb: number,
): PassResult {
  const xs = linspace(xRange[0], xRange[1], nx);
  const logPost = xs.map((x) => {
    let v = logitBetaLogDensity(x, prior[0], prior[1]);
    for (const m of models) if (m.fixedLogit !== null) v += groupLogLik(m, x + m.fixedLogit);
    return v;
  });
  // Per unknown group and grid point of p: log ∫ prior(b)·likelihood db, and each b's share of it.
  const joint = unknown.map((m, g) => {
    const range = bRanges[g] as [number, number];
    const bs = linspace(range[0], range[1], nb);
    const logPriorB = bs.map((b) => logitBetaLogDensity(b, m.alpha, m.beta));
    // exp(term − row maximum); divided by the row's sum, each b's share of the integral at p_j.
    const share = new Float64Array(nx * nb);
    const rowSum = new Float64Array(nx);
    const logL = new Float64Array(nx);
    const n = m.n;
    const failures = m.n - m.k;
    // e^(−|η|) for η = x + b is a product of e^(∓x) and e^(∓b), each worked out once per grid point.
    const upX = xs.map((x) => Math.exp(-x));
    const downX = xs.map((x) => Math.exp(x));
    const upB = bs.map((b) => Math.exp(-b));
    const downB = bs.map((b) => Math.exp(b));
    for (let j = 0; j < nx; j++) {
      const x = xs[j] as number;
      const ux = upX[j] as number;
      const dx = downX[j] as number;
      const row = j * nb;
      let max = -Infinity;
      for (let l = 0; l < nb; l++) {
        const eta = x + (bs[l] as number);
        // k·log σ(η) + (n−k)·log σ(−η), with log σ(−η) = log σ(η) − η: one logarithm, not two;
        // log σ(η) = −log(1 + e^−η) for η ≥ 0, else η − log(1 + e^η) (grid.ts's logSigmoid).
        const ls = eta >= 0 ? -Math.log1p(ux * (upB[l] as number)) : eta - Math.log1p(dx * (downB[l] as number));
        const t = (logPriorB[l] as number) + n * ls - failures * eta;
        share[row + l] = t;
        if (t > max) max = t;
      }
      let sum = 0;
      for (let l = 0; l < nb; l++) {
        const e = Math.exp((share[row + l] as number) - max);
        share[row + l] = e;
        sum += e;
      }
      rowSum[j] = sum;
      logL[j] = max + Math.log(sum);
    }
    for (let j = 0; j < nx; j++) logPost[j] = (logPost[j] as number) + (logL[j] as number);
    return { bs, share, rowSum };
  });
  // Marginal of each b: Σ_j posterior(p_j) · share of b at p_j, scaled by the largest posterior term.
  let top = -Infinity;
  for (let j = 0; j < nx; j++) top = Math.max(top, logPost[j] as number);
  const weight = logPost.map((v) => Math.exp(v - top));
  const bMarginals = joint.map(({ bs, share, rowSum }) => {
    const total = new Float64Array(nb);
    for (let j = 0; j < nx; j++) {
      const w = (weight[j] as number) / (rowSum[j] as number);
      if (w === 0) continue;
      const row = j * nb;
      for (let l = 0; l < nb; l++) total[l] = (total[l] as number) + w * (share[row + l] as number);
    }
    return { grid: bs, logDensity: total.map((v) => top + Math.log(v)) };
  });
  return { xs, logPost, bMarginals };
}
