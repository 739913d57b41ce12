/**
 * Helpers for deterministic quadrature on uniform grids: the composite trapezoid rule,
 * which for smooth densities that vanish at both ends of the range converges faster than
 * any power of the spacing (Trefethen and Weideman 2014, "The exponentially convergent
 * trapezoidal rule", SIAM Review 56(3)).
 */

export function linspace(lo: number, hi: number, size: number): Float64Array {
  const h = (hi - lo) / (size - 1);
  return Float64Array.from({ length: size }, (_, i) => lo + i * h);
}

/** log(σ(x)) = −log(1 + e^−x), computed without overflow. */
export function logSigmoid(x: number): number {
  return x >= 0 ? -Math.log1p(Math.exp(-x)) : x - Math.log1p(Math.exp(x));
}

export function logSumExp(values: ArrayLike<number>): number {
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) max = Math.max(max, values[i] as number);
  if (max === -Infinity) return -Infinity;
  let sum = 0;
  for (let i = 0; i < values.length; i++) sum += Math.exp((values[i] as number) - max);
  return max + Math.log(sum);
}

/** Range of grid points whose log density is within `drop` of the largest, widened by `pad` points. */
export function massRange(grid: Float64Array, logDensity: Float64Array, drop = 50, pad = 2): [number, number] {
  let max = -Infinity;
  logDensity.forEach((v) => (max = Math.max(max, v)));
  let first = grid.length - 1;
  let last = 0;
  logDensity.forEach((v, i) => {
    if (v >= max - drop) {
      first = Math.min(first, i);
      last = Math.max(last, i);
    }
  });
  return [grid[Math.max(0, first - pad)] as number, grid[Math.min(grid.length - 1, last + pad)] as number];
}

/** A normalised density known at the points of a uniform grid, read with the trapezoid rule. */
export class GridDensity {
  private readonly density: Float64Array;
  private readonly cumulative: Float64Array;
  private readonly h: number;

  constructor(private readonly grid: Float64Array, logDensity: Float64Array) {
    let max = -Infinity;
    logDensity.forEach((v) => (max = Math.max(max, v)));
    this.h = (grid[1] as number) - (grid[0] as number);
    const f = logDensity.map((v) => Math.exp(v - max));
    const c = new Float64Array(f.length);
    for (let i = 1; i < f.length; i++) c[i] = (c[i - 1] as number) + (this.h * ((f[i - 1] as number) + (f[i] as number))) / 2;
    const total = c[c.length - 1] as number;
    this.density = f.map((v) => v / total);
    this.cumulative = c.map((v) => v / total);
  }

  /** ∫ g(x) f(x) dx. */
  expectation(g: (x: number) => number): number {
    let sum = 0;
    const last = this.grid.length - 1;
    this.grid.forEach((x, i) => (sum += (i === 0 || i === last ? 0.5 : 1) * (this.density[i] as number) * g(x)));
    return sum * this.h;
  }

  /** P(X ≤ x), with the density taken as linear between grid points. */
  cdf(x: number): number {
    const x0 = this.grid[0] as number;
    if (x <= x0) return 0;
    const i = Math.floor((x - x0) / this.h);
    if (i >= this.grid.length - 1) return 1;
    const s = (x - (this.grid[i] as number)) / this.h;
    const f0 = this.density[i] as number;
    const f1 = this.density[i + 1] as number;
    return (this.cumulative[i] as number) + this.h * (f0 * s + ((f1 - f0) * s * s) / 2);
  }

  /** x with P(X ≤ x) = q, solving the quadratic of the linear piece exactly. */
  quantile(q: number): number {
    const c = this.cumulative;
    let lo = 0;
    let hi = c.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if ((c[mid] as number) < q) lo = mid;
      else hi = mid;
    }
    const f0 = this.density[lo] as number;
    const f1 = this.density[lo + 1] as number;
    const need = (q - (c[lo] as number)) / this.h;
    const slope = f1 - f0;
    let s: number;
    if (Math.abs(slope) < 1e-12 * Math.max(f0, f1, 1e-300)) s = f0 > 0 ? need / f0 : 0.5;
    else s = (-f0 + Math.sqrt(Math.max(0, f0 * f0 + 2 * slope * need))) / slope;
    return (this.grid[lo] as number) + Math.min(1, Math.max(0, s)) * this.h;
  }
}
