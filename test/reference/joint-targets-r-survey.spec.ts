import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { csvColumn, plumbline, runR, tempDir } from './tools.js';
import { readFileSync } from 'node:fs';

describe('weighting to a joint age band × sex table on the Vellmoor demo file, against R survey', () => {
  const dir = tempDir();
  const demo = join(process.cwd(), 'docs/examples');
  const result = plumbline(['weight', '--data', join(demo, 'vellmoor-tram-interviews.csv'), '--targets', join(demo, 'vellmoor-targets-joint.csv'),
    '--out', join(dir, 'out.csv'), '--outcome', 'supports_tram', '--tolerance', '1e-12', '--max-iterations', '1000']);

  it('gives the weights, share, standard error and Korn–Graubard interval of calibrate(~agesex + region + education, calfun = "raking")', () => {
    expect(result.code).toBe(0);
    // Reference: R survey 4.1 calibrate with the joint cells as one factor (agesex) and the
    // other variables' margins as population totals; svymean and svyciprop(method = "beta").
    const out = runR(`
suppressMessages(library(survey))
d <- read.csv("${join(demo, 'vellmoor-tram-interviews.csv')}", colClasses = "character")
d$y <- as.numeric(d$supports_tram)
d$agesex <- paste(d$age_band, d$sex, sep = " × ")
t <- read.csv("${join(demo, 'vellmoor-targets-joint.csv')}", colClasses = c("character", "character", "numeric"), encoding = "UTF-8")
t$variable[t$variable == "age_band × sex"] <- "agesex"
des <- svydesign(ids = ~1, weights = ~1, data = d)
f <- ~agesex + region + education
mm <- model.matrix(f, d)
pop <- setNames(numeric(ncol(mm)), colnames(mm))
pop["(Intercept)"] <- nrow(d)
for (v in unique(t$variable)) {
  s <- t[t$variable == v, ]
  for (i in seq_len(nrow(s))) {
    name <- paste0(v, s$category[i])
    if (name %in% names(pop)) pop[name] <- s$share[i] / sum(s$share) * nrow(d)
  }
}
cal <- calibrate(des, f, population = pop, calfun = "raking", epsilon = 1e-12, maxit = 500)
w <- weights(cal) / mean(weights(cal))
m <- svymean(~y, cal)
ci <- attr(svyciprop(~y, cal, method = "beta"), "ci")
writeLines(format(w, digits = 17), "r-weights.txt")
cat(format(c(coef(m), SE(m), ci), digits = 17), sep = "\\n")
`, dir);
    const [share, se, lower, upper] = out.trim().split('\n').map(Number) as number[];
    const outcome = result.json.outcome as { weighted: number; standardError: number; interval: [number, number] };
    expect(Math.abs(outcome.weighted - (share as number))).toBeLessThan(1e-9);
    expect(Math.abs(outcome.standardError / (se as number) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(outcome.interval[0] / (lower as number) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(outcome.interval[1] / (upper as number) - 1)).toBeLessThan(1e-6);
    const ours = csvColumn(readFileSync(join(dir, 'out.csv'), 'utf8'), 'weight');
    const theirs = readFileSync(join(dir, 'r-weights.txt'), 'utf8').trim().split('\n').map(Number);
    expect(Math.max(...ours.map((w, i) => Math.abs(w - (theirs[i] as number))))).toBeLessThan(1e-8);
  });
});
