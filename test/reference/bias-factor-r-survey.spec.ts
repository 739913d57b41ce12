import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { jackknifeBiasFactor } from '../../api/src/estimation/bias-factor-jackknife.js';
import { summariseWeighting, type OutcomeRakingCell } from '../../api/src/estimation/weighting-summary.js';
import { runR, tempDir } from './tools.js';

/**
 * The implied bias factor's interval on a small sample with a rare answer (17 yes of 160),
 * where Plumbline takes it from the delete-one jackknife, against R survey 4.1: a JK1
 * replicate design (as.svrepdesign, one replicate per interview), calibrated by raking in
 * every replicate (calibrate on a replicate design), logit(u) − logit(w) per replicate by
 * withReplicates; and the delta method against R's calibration influence. One case with
 * equal base weights, one with base weights 1 and 2.
 */
const CELLS: [string, string, number, number, number][] = [
  ['1', '1', 30, 4, 1], ['1', '2', 22, 1, 2], ['2', '1', 25, 2, 1], ['2', '2', 35, 5, 1], ['3', '1', 18, 3, 2], ['3', '2', 30, 2, 1],
];
const TARGETS = [
  { variable: 'a', shares: [{ category: '1', share: 0.3 }, { category: '2', share: 0.4 }, { category: '3', share: 0.3 }] },
  { variable: 'b', shares: [{ category: '1', share: 0.48 }, { category: '2', share: 0.52 }] },
];
const OPTIONS = { tolerance: 1e-13, maxIterations: 2000 };

function reference(withBaseWeights: boolean): { factor: number; jackknife: number[]; delta: number[] } {
  const dir = tempDir();
  const rows = CELLS.flatMap(([a, b, count, yes, bw]) => Array.from({ length: count }, (_, i) => `${a},${b},${i < yes ? 1 : 0},${withBaseWeights ? bw : 1}`));
  writeFileSync(join(dir, 'data.csv'), ['a,b,y,bw', ...rows].join('\n'));
  const out = runR(`
suppressMessages(library(survey))
d <- read.csv("data.csv", colClasses = c("character", "character", "numeric", "numeric"))
n <- nrow(d)
pop <- c("(Intercept)" = n, a2 = 0.4 * n, a3 = 0.3 * n, b2 = 0.52 * n)
des <- svydesign(ids = ~1, weights = ~bw, data = d)
z <- qnorm(0.975)
cal <- calibrate(des, ~a + b, population = pop, calfun = "raking", epsilon = 1e-12, maxit = 500)
m <- svymean(~y, cal, influence = TRUE)
ps <- cal$postStrata[[1]]
e <- qr.resid(ps$qr, attr(m, "influence") / ps$w) * ps$w
u <- mean(d$y); w <- coef(m)[[1]]; centre <- qlogis(u) - qlogis(w)
dd <- (d$y - u) / n / (u * (1 - u)) - e / (w * (1 - w))
se <- sqrt(n / (n - 1) * sum((dd - mean(dd))^2))
rep <- as.svrepdesign(des, type = "JK1", compress = FALSE)
calr <- calibrate(rep, ~a + b, population = pop, calfun = "raking", epsilon = 1e-12, maxit = 500, compress = FALSE)
jk <- withReplicates(calr, function(wts, data) {
  keep <- wts > 0
  qlogis(mean(data$y[keep])) - qlogis(sum(wts * data$y) / sum(wts))
})
sj <- SE(jk)[[1]]
cat(format(c(plogis(centre), plogis(centre - z * sj), plogis(centre + z * sj), plogis(centre - z * se), plogis(centre + z * se)), digits = 17), sep = "\\n")
`, dir);
  const [factor, jl, ju, dl, du] = out.trim().split('\n').map(Number) as number[];
  return { factor: factor as number, jackknife: [jl as number, ju as number], delta: [dl as number, du as number] };
}

const cellsOf = (withBaseWeights: boolean): OutcomeRakingCell[] =>
  CELLS.map(([a, b, count, successes, bw]) => ({ categories: { a, b }, count, successes, baseWeight: withBaseWeights ? bw : 1 }));

describe.each([false, true])('implied bias factor interval on a sparse sample against R survey (base weights: %s)', (withBaseWeights) => {
  const r = reference(withBaseWeights);
  const summary = summariseWeighting(cellsOf(withBaseWeights), TARGETS, OPTIONS).outcome!;

  it('uses the jackknife below 100 interviews of the less common answer, and its interval equals R\'s JK1 with re-calibrated replicates', () => {
    expect(summary.impliedBiasFactorMethod).toMatch(/jackknife/);
    expect(Math.abs((summary.impliedBiasFactor as number) - r.factor)).toBeLessThan(1e-9);
    const [lower, upper] = summary.impliedBiasFactorInterval as [number, number];
    expect(Math.abs(lower / (r.jackknife[0] as number) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(upper / (r.jackknife[1] as number) - 1)).toBeLessThan(1e-6);
  });

  it('re-rakes at most twice per cell rather than once per interview', () => {
    // 6 cells, 160 interviews: the jackknife needs 12 re-rakes, not 160.
    const direct = jackknifeBiasFactor(cellsOf(withBaseWeights), TARGETS, OPTIONS);
    expect(direct.lower).toBeCloseTo(summary.impliedBiasFactorInterval![0], 12);
  });

  it('the delta method on the same cells equals R\'s calibration influence joined with the unweighted share\'s', async () => {
    const { linearisedShare } = await import('../../api/src/estimation/linearised-share.js');
    const { impliedBiasFactor } = await import('../../api/src/estimation/bias-factor.js');
    const { rake } = await import('../../api/src/estimation/raking.js');
    const cells = cellsOf(withBaseWeights);
    const weights = rake(cells, TARGETS, OPTIONS).weights;
    const levels = (c: OutcomeRakingCell) => [Number(c.categories.a) - 1, Number(c.categories.b) - 1];
    const share = linearisedShare(cells.map((c, j) => ({ levels: levels(c), count: c.count, successes: c.successes, baseWeight: c.baseWeight ?? 1, weight: weights[j] as number })));
    const delta = impliedBiasFactor(cells, share);
    expect(Math.abs((delta.lower as number) / (r.delta[0] as number) - 1)).toBeLessThan(1e-6);
    expect(Math.abs((delta.upper as number) / (r.delta[1] as number) - 1)).toBeLessThan(1e-6);
  });
});
