import { EstimationInputError } from './errors.js';

/** One raking cell after weighting: its interviews, how many answered 1, base and final weight. */
export interface CalibratedCell {
  /** Index of the cell's category in each raking variable (same order for every cell). */
  levels: readonly number[];
  count: number;
  successes: number;
  /** Base weight of each interview in the cell (1 when there are none). */
  baseWeight: number;
  /** Final (raked) weight of each interview in the cell; any scale. */
  weight: number;
}

/** Influence of one interview of a cell on the weighted share, for y = 1 and y = 0. */
export interface CellInfluence {
  yes: number;
  no: number;
}

export interface LinearisedShare {
  share: number;
  standardError: number;
  /**
   * Per cell, each interview's linearised influence on the share after calibration
   * (u_i below, centred to mean 0): what a joint variance with another statistic of the
   * same interviews needs, such as the implied bias factor.
   */
  influence: CellInfluence[];
}

/**
 * Weighted share of a 0/1 outcome and its standard error linearised through the raking
 * (Deville and Särndal 1992, JASA 87:376; Särndal, Swensson and Wretman 1992, §6.5–6.6), in
 * the form R's survey package uses for `svymean` on a `calibrate(..., calfun = "raking")`
 * design with one stage and no strata: each interview's z_i = (y_i − ŵ) / Σw is regressed
 * on the raking variables' category indicators weighted by the base weights; the residuals
 * times the final weights, u_i, give V = n/(n−1) · Σ (u_i − ū)².
 *
 * Interviews of a cell differ only by y, so the regression and the sums are done on cell
 * totals: the cost follows the number of cells, not interviews.
 */
export function linearisedShare(cells: readonly CalibratedCell[]): LinearisedShare {
  if (cells.length === 0) throw new EstimationInputError('no interviews to weight');
  const variables = cells[0]?.levels.length ?? 0;
  let n = 0;
  let total = 0;
  let yes = 0;
  for (const [j, c] of cells.entries()) {
    if (c.levels.length !== variables) throw new EstimationInputError(`cell ${j}: expected ${variables} category indices`);
    if (!(Number.isFinite(c.count) && c.count >= 0)) throw new EstimationInputError(`cell ${j}: count must be a non-negative number`);
    if (!(c.successes >= 0 && c.successes <= c.count)) throw new EstimationInputError(`cell ${j}: successes must lie between 0 and the count`);
    if (!(c.baseWeight > 0 && Number.isFinite(c.baseWeight))) throw new EstimationInputError(`cell ${j}: base weight must be above 0`);
    if (!(c.weight >= 0 && Number.isFinite(c.weight))) throw new EstimationInputError(`cell ${j}: weight must be a non-negative number`);
    n += c.count;
    total += c.count * c.weight;
    yes += c.successes * c.weight;
  }
  if (!(n > 1 && total > 0)) throw new EstimationInputError('need at least two weighted interviews for a standard error');
  const share = yes / total;

  // Columns: intercept, then one indicator per category of each variable after its first.
  const offsets: number[] = [];
  let p = 1;
  for (let v = 0; v < variables; v++) {
    offsets.push(p - 1);
    p += Math.max(0, ...cells.map((c) => c.levels[v] as number));
  }
  const columns = (c: CalibratedCell): number[] => {
    const cols = [0];
    c.levels.forEach((level, v) => {
      if (level > 0) cols.push((offsets[v] as number) + level);
    });
    return cols;
  };
  // Normal equations X'DX β = X'D z over cells; a cell's z-total is (s − n·ŵ)/Σw.
  const gram = Array.from({ length: p }, () => new Float64Array(p));
  const rhs = new Float64Array(p);
  const cellColumns = cells.map(columns);
  cells.forEach((c, j) => {
    const cols = cellColumns[j] as number[];
    const zTotal = (c.successes - c.count * share) / total;
    for (const a of cols) {
      rhs[a] = (rhs[a] as number) + c.baseWeight * zTotal;
      const row = gram[a] as Float64Array;
      for (const b of cols) row[b] = (row[b] as number) + c.baseWeight * c.count;
    }
  });
  const beta = solveSymmetric(gram, rhs);

  // u = w·(z − x'β) takes two values in a cell (y = 1 and y = 0).
  let sum = 0;
  const raw = cells.map((c, j) => {
    const fitted = (cellColumns[j] as number[]).reduce((s, a) => s + (beta[a] as number), 0);
    const yes = c.weight * ((1 - share) / total - fitted);
    const no = c.weight * (-share / total - fitted);
    sum += c.successes * yes + (c.count - c.successes) * no;
    return { yes, no };
  });
  const mean = sum / n;
  const influence = raw.map(({ yes, no }) => ({ yes: yes - mean, no: no - mean }));
  return { share, standardError: Math.sqrt(withReplacementVariance(cells, influence)), influence };
}

/** n/(n−1) · Σ u_i² over the interviews of cells whose influences are centred (mean 0). */
export function withReplacementVariance(cells: readonly { count: number; successes: number }[], influence: readonly CellInfluence[]): number {
  let n = 0;
  let sumSquares = 0;
  cells.forEach((c, j) => {
    const { yes, no } = influence[j] as CellInfluence;
    n += c.count;
    sumSquares += c.successes * yes * yes + (c.count - c.successes) * no * no;
  });
  return n > 1 ? (n / (n - 1)) * sumSquares : NaN;
}

/**
 * Solves A β = b for a symmetric positive semi-definite A by Gauss–Jordan elimination with
 * diagonal pivoting; columns whose pivot vanishes (categories aliased by others, or empty)
 * are left at 0, which leaves the fitted values, and so the residuals, unchanged.
 */
function solveSymmetric(matrix: Float64Array[], rhs: Float64Array): Float64Array {
  const p = rhs.length;
  const a = matrix.map((row) => Float64Array.from(row));
  const b = Float64Array.from(rhs);
  const scale = Math.max(...a.map((row, i) => Math.abs(row[i] as number)));
  const done = new Array<boolean>(p).fill(false);
  const beta = new Float64Array(p);
  for (let step = 0; step < p; step++) {
    let k = -1;
    let best = 0;
    for (let i = 0; i < p; i++) {
      const d = Math.abs((a[i] as Float64Array)[i] as number);
      if (!done[i] && d > best) [k, best] = [i, d];
    }
    if (k < 0 || best <= 1e-12 * scale) break;
    done[k] = true;
    const rowK = a[k] as Float64Array;
    const pivot = rowK[k] as number;
    for (let i = 0; i < p; i++) {
      if (i === k) continue;
      const rowI = a[i] as Float64Array;
      const f = (rowI[k] as number) / pivot;
      if (f === 0) continue;
      for (let c = 0; c < p; c++) rowI[c] = (rowI[c] as number) - f * (rowK[c] as number);
      b[i] = (b[i] as number) - f * (b[k] as number);
    }
  }
  for (let i = 0; i < p; i++) if (done[i]) beta[i] = (b[i] as number) / ((a[i] as Float64Array)[i] as number);
  return beta;
}
