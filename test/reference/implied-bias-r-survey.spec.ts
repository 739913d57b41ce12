import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { plumbline, runR, tempDir } from './tools.js';

describe('implied bias factor and margin of error on the Vellmoor demo file, against R survey', () => {
  const dir = tempDir();
  const demo = join(process.cwd(), 'docs/examples');
  const result = plumbline(['weight', '--data', join(demo, 'vellmoor-tram-interviews.csv'), '--targets', join(demo, 'vellmoor-targets.csv'),
    '--out', join(dir, 'out.csv'), '--outcome', 'supports_tram', '--tolerance', '1e-12', '--max-iterations', '1000']);
  const outcome = result.json.outcome as Record<string, number & number[]>;
  const CALIBRATE = `
suppressMessages(library(survey))
d <- read.csv("${join(demo, 'vellmoor-tram-interviews.csv')}", colClasses = "character")
d$y <- as.numeric(d$supports_tram)
t <- read.csv("${join(demo, 'vellmoor-targets.csv')}", colClasses = c("character", "character", "numeric"))
des <- svydesign(ids = ~1, weights = ~1, data = d)
f <- ~age_band + sex + region + education
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
`;

  it('matches the delta-method interval on logit(u) − logit(w) with w linearised through R\'s own calibration', () => {
    expect(result.code).toBe(0);
    expect(outcome.impliedBiasFactorMethod).toMatch(/^delta method/);
    // Reference: R survey 4.1 calibrate(calfun = "raking") on the four margins; the share's
    // influence after calibration is R's pre-calibration influence (svymean(influence = TRUE))
    // projected on R's own calibration fit (postStrata[[1]]$qr, as svyrecvar does), checked to
    // give SE(svymean(~y, cal)); joined with the unweighted share's influence (y − u)/n.
    const out = runR(`${CALIBRATE}
m <- svymean(~y, cal, influence = TRUE)
ps <- cal$postStrata[[1]]
e <- qr.resid(ps$qr, attr(m, "influence") / ps$w) * ps$w
n <- nrow(d); u <- mean(d$y); w <- coef(m)[[1]]
stopifnot(abs(sqrt(n / (n - 1) * sum((e - mean(e))^2)) / SE(m) - 1) < 1e-9)
dd <- (d$y - u) / n / (u * (1 - u)) - e / (w * (1 - w))
se <- sqrt(n / (n - 1) * sum((dd - mean(dd))^2))
centre <- qlogis(u) - qlogis(w); z <- qnorm(0.975)
cat(format(c(plogis(centre), plogis(centre - z * se), plogis(centre + z * se), w), digits = 17), sep = "\\n")
`, dir);
    const [factor, lower, upper, weighted] = out.trim().split('\n').map(Number);
    expect(Math.abs((outcome.impliedBiasFactor as number) - (factor as number))).toBeLessThan(1e-9);
    expect(Math.abs(((outcome.impliedBiasFactorInterval as number[])[0] as number) / (lower as number) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(((outcome.impliedBiasFactorInterval as number[])[1] as number) / (upper as number) - 1)).toBeLessThan(1e-6);
    expect(Math.abs((outcome.weighted as number) - (weighted as number))).toBeLessThan(1e-9);
  });

  it('keeps Kish\'s deff as the cost of weighting and reports marginOfError as 1.96 linearised standard errors', () => {
    const text = readFileSync(join(dir, 'out.csv'), 'utf8').trim().split('\n').slice(1);
    const w = text.map((l) => Number(l.split(',').at(-1)));
    const n = w.length;
    // Kish (1965): deff = n·Σw² / (Σw)², computed here from the output file by hand.
    const deff = (n * w.reduce((s, x) => s + x * x, 0)) / w.reduce((s, x) => s + x, 0) ** 2;
    expect(result.json.designEffect as number).toBeCloseTo(deff, 10);
    // Reference: R survey 4.1 SE(svymean(~y, calibrate(..., calfun = "raking"))) on the demo file's four margins.
    const out = runR(`
${CALIBRATE}
cat(format(SE(svymean(~y, cal)), digits = 17))
`, dir);
    expect(Math.abs((outcome.standardError as number) / Number(out) - 1)).toBeLessThan(1e-6);
    expect(outcome.marginOfError as number).toBeCloseTo(1.96 * (outcome.standardError as number), 12);
  });
});
