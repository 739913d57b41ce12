// The interviewer checks against R (stats package, R 4.x): mantelhaen.test(correct = FALSE),
// p.adjust(method = "BH") and the mean squares of aov, on invented data drawn with a seed.
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { seeded } from '../../api/src/demo/vellmoor.js';
import { benjaminiHochberg, mantelHaenszel, type StratumCounts } from '../../api/src/estimation/mantel-haenszel.js';
import { deviationsFromCellMeans, interviewerCorrelation } from '../../api/src/estimation/interviewer-correlation.js';
import { runR, tempDir } from './tools.js';

interface Row {
  interviewer: string;
  cell: string;
  yes: number;
}

/** Interviews by 6 interviewers over 8 cells with unequal workloads; interviewer D leans towards yes. */
function draw(seed: number, lean: number): Row[] {
  const random = seeded(seed);
  const rows: Row[] = [];
  const interviewers = ['A', 'B', 'C', 'D', 'E', 'F'];
  const workloads = [40, 25, 60, 35, 18, 50];
  interviewers.forEach((interviewer, j) => {
    for (let i = 0; i < (workloads[j] as number); i++) {
      const cell = `c${Math.floor(random() * 8) + 1}`;
      const base = 0.3 + 0.05 * Number(cell.slice(1));
      const rate = interviewer === 'D' ? Math.min(0.95, base + lean) : base;
      rows.push({ interviewer, cell, yes: random() < rate ? 1 : 0 });
    }
  });
  return rows;
}

/** The 2 × 2 tables of one interviewer against the others, one per cell with at least 2 interviews. */
function strataFor(rows: Row[], interviewer: string): { cell: string; counts: StratumCounts }[] {
  const cells = [...new Set(rows.map((r) => r.cell))].sort();
  return cells
    .map((cell) => {
      const inCell = rows.filter((r) => r.cell === cell);
      const mine = inCell.filter((r) => r.interviewer === interviewer);
      const others = inCell.filter((r) => r.interviewer !== interviewer);
      const yes = (list: Row[]) => list.filter((r) => r.yes === 1).length;
      return { cell, counts: { thisYes: yes(mine), thisNo: mine.length - yes(mine), otherYes: yes(others), otherNo: others.length - yes(others) } };
    })
    .filter(({ counts }) => counts.thisYes + counts.thisNo + counts.otherYes + counts.otherNo >= 2);
}

function writeRows(dir: string, rows: Row[]): string {
  const file = join(dir, 'rows.csv');
  writeFileSync(file, `interviewer,cell,yes\n${rows.map((r) => `${r.interviewer},${r.cell},${r.yes}`).join('\n')}\n`);
  return file;
}

describe('Cochran–Mantel–Haenszel test of each interviewer against the others, and BH across them', () => {
  for (const [seed, lean] of [[11, 0.25], [12, 0]] as const) {
    it(`equals R mantelhaen.test(correct = FALSE) and p.adjust("BH") (seed ${seed}, lean ${lean})`, () => {
      const rows = draw(seed, lean);
      const dir = tempDir();
      const file = writeRows(dir, rows);
      const out = runR(`
d <- read.csv("${file}", colClasses = c("character", "character", "integer"))
ids <- sort(unique(d$interviewer))
p <- c(); s <- c()
for (j in ids) {
  keep <- names(which(table(d$cell) >= 2))
  e <- d[d$cell %in% keep, ]
  x <- table(factor(e$interviewer == j, levels = c(TRUE, FALSE)), factor(e$yes, levels = c(1, 0)), e$cell)
  t <- mantelhaen.test(x, correct = FALSE)
  p <- c(p, t$p.value); s <- c(s, t$statistic)
}
cat(format(c(s, p, p.adjust(p, method = "BH")), digits = 17), sep = "\\n")`, dir);
      const r = out.trim().split('\n').map(Number);
      const ids = ['A', 'B', 'C', 'D', 'E', 'F'];
      const ours = ids.map((id) => mantelHaenszel(strataFor(rows, id).map((s) => s.counts))!);
      ids.forEach((_, j) => {
        expect(ours[j]!.statistic).toBeCloseTo(r[j] as number, 9);
        expect(ours[j]!.pValue).toBeCloseTo(r[6 + j] as number, 9);
      });
      const adjusted = benjaminiHochberg(ours.map((o) => o.pValue));
      adjusted.forEach((a, j) => expect(a).toBeCloseTo(r[12 + j] as number, 9));
    });
  }
});

describe('intra-interviewer correlation, one-way ANOVA estimator with unequal workloads (Kish 1962)', () => {
  for (const [seed, lean] of [[21, 0.2], [22, 0]] as const) {
    it(`takes MSB and MSW from R aov on the answers minus their cell means (seed ${seed}, lean ${lean})`, () => {
      const rows = draw(seed, lean);
      const dir = tempDir();
      const file = writeRows(dir, rows);
      const out = runR(`
d <- read.csv("${file}", colClasses = c("character", "character", "integer"))
d$dev <- d$yes - ave(d$yes, d$cell)
fit <- aov(dev ~ factor(interviewer), data = d)
ms <- summary(fit)[[1]][["Mean Sq"]]
m <- as.numeric(table(d$interviewer)); n <- sum(m); J <- length(m)
m0 <- (n - sum(m^2) / n) / (J - 1)
rho <- (ms[1] - ms[2]) / (ms[1] + (m0 - 1) * ms[2])
cat(format(c(ms[1], ms[2], m0, rho, sum(m^2) / n), digits = 17), sep = "\\n")`, dir);
      const [msb, msw, m0, rho, mStar] = out.trim().split('\n').map(Number) as [number, number, number, number, number];
      const groups = deviationsFromCellMeans(rows.map((r) => ({ interviewer: r.interviewer, cell: r.cell, value: r.yes })));
      const ours = interviewerCorrelation([...groups.values()])!;
      expect(ours.meanSquareBetween).toBeCloseTo(msb, 10);
      expect(ours.meanSquareWithin).toBeCloseTo(msw, 10);
      expect(ours.m0).toBeCloseTo(m0, 10);
      expect(ours.rawRho).toBeCloseTo(rho, 10);
      expect(ours.rho).toBe(Math.max(0, ours.rawRho));
      expect(ours.designEffect).toBeCloseTo(1 + Math.max(0, rho) * (mStar - 1), 10);
      if (lean > 0) expect(ours.rho).toBeGreaterThan(0);
    });
  }
});
