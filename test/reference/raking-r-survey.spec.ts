import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { writeFiles } from '../../bench/generate-data.js';
import { rake } from '../../api/src/estimation/raking.js';
import { csvColumn, plumbline, runR, tempDir } from './tools.js';

const R_RAKE_FROM_FILES = `
suppressMessages(library(survey))
d <- read.csv("data.csv", stringsAsFactors = FALSE, check.names = FALSE, colClasses = "character")
t <- read.csv("targets.csv", stringsAsFactors = FALSE, colClasses = c("character", "character", "numeric"))
d$bw <- if ("base" %in% names(d)) as.numeric(d$base) else 1
n <- nrow(d)
vars <- unique(t$variable)
pops <- lapply(vars, function(v) {
  s <- t[t$variable == v, ]
  df <- data.frame(s$category, s$share / sum(s$share) * sum(d$bw), stringsAsFactors = FALSE)
  names(df) <- c(v, "Freq")
  df
})
forms <- lapply(vars, function(v) as.formula(paste0("~\`", v, "\`")))
des <- svydesign(ids = ~1, weights = ~bw, data = d)
r <- rake(des, forms, pops, control = list(maxit = 1000, epsilon = 1e-13))
w <- weights(r)
writeLines(format(w / mean(w), digits = 17), "r-weights.txt")
`;

const readNumbers = (file: string) => readFileSync(file, 'utf8').trim().split('\n').map(Number);

describe('raking against R survey::rake (r-cran-survey, survey 4.1)', () => {
  it('gives the same weights to 1e-6 on a generated data set with four margins', () => {
    const dir = tempDir();
    writeFiles(3000, 11, join(dir, 'data.csv'), join(dir, 'targets.csv'));
    const result = plumbline(['weight', '--data', join(dir, 'data.csv'), '--targets', join(dir, 'targets.csv'),
      '--out', join(dir, 'out.csv'), '--tolerance', '1e-12', '--max-iterations', '1000']);
    expect(result.code).toBe(0);
    expect(result.json.converged).toBe(true);
    runR(R_RAKE_FROM_FILES, dir);
    const ours = csvColumn(readFileSync(join(dir, 'out.csv'), 'utf8'), 'weight');
    const reference = readNumbers(join(dir, 'r-weights.txt'));
    expect(ours).toHaveLength(3000);
    // Reference: survey::rake (Lumley, R package survey) on the same file, weights scaled to mean 1.
    ours.forEach((w, i) => expect(Math.abs(w - (reference[i] as number))).toBeLessThan(1e-6));
  });

  it('starts from base weights the way survey::rake starts from design weights', () => {
    const dir = tempDir();
    writeFiles(800, 5, join(dir, 'plain.csv'), join(dir, 'targets.csv'));
    const lines = readFileSync(join(dir, 'plain.csv'), 'utf8').trim().split('\n');
    const withBase = lines.map((l, i) => `${l},${i === 0 ? 'base' : [1, 2.5, 0.7, 1.3][i % 4]}`);
    writeFileSync(join(dir, 'data.csv'), `${withBase.join('\n')}\n`);
    const result = plumbline(['weight', '--data', join(dir, 'data.csv'), '--targets', join(dir, 'targets.csv'),
      '--out', join(dir, 'out.csv'), '--base-weight', 'base', '--tolerance', '1e-12', '--max-iterations', '1000']);
    expect(result.code).toBe(0);
    runR(R_RAKE_FROM_FILES, dir);
    const ours = csvColumn(readFileSync(join(dir, 'out.csv'), 'utf8'), 'weight');
    const reference = readNumbers(join(dir, 'r-weights.txt'));
    // Reference: survey::rake with weights = ~base (R package survey), scaled to mean 1.
    ours.forEach((w, i) => expect(Math.abs(w - (reference[i] as number))).toBeLessThan(1e-6));
  });

  it('reproduces the documented apiclus1 raking example: weights and weighted mean of api00', () => {
    const dir = tempDir();
    // The example in survey's help page for rake(): apiclus1 raked to school type and sch.wide totals.
    const out = runR(`
suppressMessages(library(survey))
data(api)
write.csv(apiclus1[, c("cds", "stype", "sch.wide", "api00", "pw")], "apiclus1.csv", row.names = FALSE)
dclus1 <- svydesign(id = ~dnum, weights = ~pw, data = apiclus1, fpc = ~fpc)
pop.types <- data.frame(stype = c("E", "H", "M"), Freq = c(4421, 755, 1018))
pop.schwide <- data.frame(sch.wide = c("No", "Yes"), Freq = c(1072, 5122))
rclus1 <- rake(dclus1, list(~stype, ~sch.wide), list(pop.types, pop.schwide), control = list(maxit = 1000, epsilon = 1e-13))
w <- weights(rclus1)
writeLines(format(w / mean(w), digits = 17), "r-weights.txt")
cat(format(coef(svymean(~api00, rclus1)), digits = 17))
`, dir);
    writeFileSync(join(dir, 'targets.csv'), 'variable,category,share\nstype,E,4421\nstype,H,755\nstype,M,1018\nsch.wide,No,1072\nsch.wide,Yes,5122\n');
    const result = plumbline(['weight', '--data', join(dir, 'apiclus1.csv'), '--targets', join(dir, 'targets.csv'),
      '--out', join(dir, 'out.csv'), '--base-weight', 'pw', '--tolerance', '1e-12', '--max-iterations', '1000']);
    expect(result.code).toBe(0);
    const text = readFileSync(join(dir, 'out.csv'), 'utf8');
    const ours = csvColumn(text, 'weight');
    const api00 = csvColumn(text, 'api00');
    const reference = readNumbers(join(dir, 'r-weights.txt'));
    expect(ours).toHaveLength(183);
    // Reference: survey::rake on data(api) apiclus1, as in the package's rake() help example.
    ours.forEach((w, i) => expect(Math.abs(w - (reference[i] as number))).toBeLessThan(1e-6));
    const weightedMean = ours.reduce((s, w, i) => s + w * (api00[i] as number), 0) / ours.reduce((s, w) => s + w, 0);
    // Reference: svymean(~api00, rclus1) from the same help example.
    expect(Math.abs(weightedMean - Number(out))).toBeLessThan(1e-6);
  });
});

describe('raking on the Kalton and Flores-Cervantes (2003) example', () => {
  // Kalton, G. and Flores-Cervantes, I. (2003), "Weighting methods", Journal of Official
  // Statistics 19(2), 81-97: sample and population cells by rows a1..a4 and columns b1..b3.
  const sample = [[20, 40, 40], [50, 140, 310], [100, 50, 50], [30, 100, 70]];
  const population = [[80, 40, 55], [60, 150, 340], [170, 60, 200], [55, 165, 125]];
  const rowTotals = population.map((r) => r.reduce((a, b) => a + b, 0));
  const columnTotals = [0, 1, 2].map((j) => population.reduce((s, r) => s + (r[j] as number), 0));
  const N = rowTotals.reduce((a, b) => a + b, 0);
  const n = sample.flat().reduce((a, b) => a + b, 0);
  const cells = sample.flatMap((row, i) => row.map((count, j) => ({ categories: { a: `a${i + 1}`, b: `b${j + 1}` }, count })));
  const result = rake(
    cells,
    [
      { variable: 'a', shares: rowTotals.map((s, i) => ({ category: `a${i + 1}`, share: s })) },
      { variable: 'b', shares: columnTotals.map((s, j) => ({ category: `b${j + 1}`, share: s })) },
    ],
    { tolerance: 1e-13, maxIterations: 1000 },
  );
  // The adjustment factor of a cell is its raked weight on the population scale (base weight 1).
  const factors = result.weights.map((w) => (w * N) / n);

  it('meets the population margins of the paper (row totals 175, 550, 430, 345; column totals 365, 415, 720)', () => {
    expect(rowTotals).toEqual([175, 550, 430, 345]);
    expect(columnTotals).toEqual([365, 415, 720]);
    sample.forEach((row, i) => {
      const total = row.reduce((s, count, j) => s + count * (factors[i * 3 + j] as number), 0);
      expect(total).toBeCloseTo(rowTotals[i] as number, 8);
    });
    [0, 1, 2].forEach((j) => {
      const total = sample.reduce((s, row, i) => s + (row[j] as number) * (factors[i * 3 + j] as number), 0);
      expect(total).toBeCloseTo(columnTotals[j] as number, 8);
    });
  });

  it('gives the same adjustment factors as survey::rake on the paper\'s cells', () => {
    const out = runR(`
suppressMessages(library(survey))
s <- expand.grid(b = c("b1", "b2", "b3"), a = c("a1", "a2", "a3", "a4"), stringsAsFactors = FALSE)
s$n <- c(${sample.flat().join(', ')})
d <- s[rep(seq_len(nrow(s)), s$n), c("a", "b")]
d$w <- 1
des <- svydesign(ids = ~1, weights = ~w, data = d)
r <- rake(des, list(~a, ~b), list(data.frame(a = c("a1", "a2", "a3", "a4"), Freq = c(${rowTotals.join(', ')})),
                                  data.frame(b = c("b1", "b2", "b3"), Freq = c(${columnTotals.join(', ')}))),
          control = list(maxit = 1000, epsilon = 1e-13))
w <- weights(r)
cat(format(w[!duplicated(paste(d$a, d$b))], digits = 17), sep = "\\n")
`);
    const reference = out.trim().split('\n').map(Number);
    expect(reference).toHaveLength(12);
    // Reference: survey::rake (R package survey) on the paper's 1,000 sample cases.
    factors.forEach((f, i) => expect(Math.abs(f - (reference[i] as number))).toBeLessThan(1e-6));
  });
});
