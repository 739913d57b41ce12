import { EstimationInputError } from './errors.js';

/**
 * One raking cell after weighting: its interviews, how many answered 1 (yes), how many
 * answered at all (yes or no), base and final weight.
 */
export interface CalibratedCell {
  /** Index of the cell's category in each raking variable (same order for every cell). */
  levels: readonly number[];
  count: number;
  successes: number;
  /** Interviews that answered yes or no (the ratio's denominator); the count when left out. */
  answered?: number;
  /** Base weight of each interview in the cell (1 when there are none). */
  baseWeight: number;
  /** Final (raked) weight of each interview in the cell; any scale. */
  weight: number;
}

/**
 * Influence of one interview of a cell on the weighted share, for y = 1 (yes), y = 0 with
 * x = 1 (no) and x = 0 (don't know or no answer: outside the ratio, but still raked).
 */
export interface CellInfluence {
  yes: number;
  no: number;
  other: number;
}

/** A cell's interviews by answer: those outside the ratio are `count − answered`. */
export interface AnswerCounts {
  count: number;
  successes: number;
  answered?: number;
}

/** Interviews of a cell that answered yes or no. */
export const answeredOf = (c: AnswerCounts): number => c.answered ?? c.count;

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
 * Weighted share of a 0/1 outcome among those who answered, R = Σw·y / Σw·x (x = 1 for a
 * yes or no, 0 for don't know or no answer; x = 1 for everyone gives the plain weighted
 * mean), and its standard error linearised through the raking (Deville and Särndal 1992,
 * JASA 87:376; Särndal, Swensson and Wretman 1992, §5.6 for the ratio and §6.5–6.6 for the
 * calibration), in the form R's survey package uses for `svyratio(~y, ~x, design)` (and so
 * `svymean` when x = 1) on a `calibrate(..., calfun = "raking")` design with one stage and
 * no strata: each interview's z_i = (y_i − R·x_i) / Σw·x is regressed on the raking
 * variables' category indicators weighted by the base weights; the residuals times the
 * final weights, u_i, give V = n/(n−1) · Σ (u_i − ū)² over all n raked interviews
 * (docs/methods.md, section 2).
 *
 * Interviews of a cell differ only by their answer, so the regression and the sums are
 * done on cell totals: the cost follows the number of cells, not interviews.
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
    const answered = answeredOf(c);
    if (!(answered >= 0 && answered <= c.count)) throw new EstimationInputError(`cell ${j}: answered must lie between 0 and the count`);
    if (!(c.successes >= 0 && c.successes <= answered)) throw new EstimationInputError(`cell ${j}: successes must lie between 0 and those who answered`);
    if (!(c.baseWeight > 0 && Number.isFinite(c.baseWeight))) throw new EstimationInputError(`cell ${j}: base weight must be above 0`);
    if (!(c.weight >= 0 && Number.isFinite(c.weight))) throw new EstimationInputError(`cell ${j}: weight must be a non-negative number`);
    n += c.count;
    total += answered * c.weight;
    yes += c.successes * c.weight;
  }
  if (!(n > 1)) throw new EstimationInputError('need at least two weighted interviews for a standard error');
  if (!(total > 0)) throw new EstimationInputError('nobody answered yes or no, so there is no share');
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
  // Normal equations X'DX β = X'D z over cells; a cell's z-total is (s − a·R)/Σw·x.
  const gram = Array.from({ length: p }, () => new Float64Array(p));
  const rhs = new Float64Array(p);
  const cellColumns = cells.map(columns);
  cells.forEach((c, j) => {
    const cols = cellColumns[j] as number[];
    const zTotal = (c.successes - answeredOf(c) * share) / total;
    for (const a of cols) {
      rhs[a] = (rhs[a] as number) + c.baseWeight * zTotal;
      const row = gram[a] as Float64Array;
      for (const b of cols) row[b] = (row[b] as number) + c.baseWeight * c.count;
    }
  });
  const beta = solveSymmetric(gram, rhs);

  // u = w·(z − x'β) takes three values in a cell (yes, no, and neither).
  let sum = 0;
  const raw = cells.map((c, j) => {
    const fitted = (cellColumns[j] as number[]).reduce((s, a) => s + (beta[a] as number), 0);
    const yes = c.weight * ((1 - share) / total - fitted);
    const no = c.weight * (-share / total - fitted);
    const other = c.weight * -fitted;
    const answered = answeredOf(c);
    sum += c.successes * yes + (answered - c.successes) * no + (c.count - answered) * other;
    return { yes, no, other };
  });
  const mean = sum / n;
  const influence = raw.map(({ yes, no, other }) => ({ yes: yes - mean, no: no - mean, other: other - mean }));
  return { share, standardError: Math.sqrt(withReplacementVariance(cells, influence)), influence };
}

/** n/(n−1) · Σ u_i² over the interviews of cells whose influences are centred (mean 0). */
export function withReplacementVariance(cells: readonly AnswerCounts[], influence: readonly CellInfluence[]): number {
  let n = 0;
  let sumSquares = 0;
  cells.forEach((c, j) => {
    const { yes, no, other } = influence[j] as CellInfluence;
    const answered = answeredOf(c);
    n += c.count;
    sumSquares += c.successes * yes * yes + (answered - c.successes) * no * no + (c.count - answered) * other * other;
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
