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

  it('matches the delta-method interval R gives for logit(u) − logit(w)', () => {
    expect(result.code).toBe(0);
    // Reference: survey::svycontrast (delta method, Lumley's R package survey) on svymean of
    // y, y·g and g (g the raked weight) under equal-weight sampling, the same linearisation.
    const out = runR(`
suppressMessages(library(survey))
d <- read.csv("out.csv")
d$y <- d$supports_tram
d$g <- d$weight
d$yg <- d$y * d$g
d$one <- 1
des <- svydesign(ids = ~1, weights = ~one, data = d)
m <- svymean(~y + yg + g, des)
b <- svycontrast(m, quote(log(y / (1 - y)) - log((yg / g) / (1 - yg / g))))
z <- qnorm(0.975)
centre <- coef(b); se <- SE(b)
cat(format(c(plogis(centre), plogis(centre - z * se), plogis(centre + z * se), coef(svymean(~y, svydesign(ids = ~1, weights = ~g, data = d)))), digits = 17), sep = "\\n")
`, dir);
    const [factor, lower, upper, weighted] = out.trim().split('\n').map(Number);
    expect(Math.abs((outcome.impliedBiasFactor as number) - (factor as number))).toBeLessThan(1e-9);
    expect(Math.abs(((outcome.impliedBiasFactorInterval as number[])[0] as number) - (lower as number))).toBeLessThan(1e-9);
    expect(Math.abs(((outcome.impliedBiasFactorInterval as number[])[1] as number) - (upper as number))).toBeLessThan(1e-9);
    expect(Math.abs((outcome.weighted as number) - (weighted as number))).toBeLessThan(1e-9);
  });

  it('reports the margin of error 1.96·√(deff·p(1−p)/n) with Kish\'s deff from the written weights', () => {
    const text = readFileSync(join(dir, 'out.csv'), 'utf8').trim().split('\n').slice(1);
    const w = text.map((l) => Number(l.split(',').at(-1)));
    const n = w.length;
    // Kish (1965): deff = n·Σw² / (Σw)², computed here from the output file by hand.
    const deff = (n * w.reduce((s, x) => s + x * x, 0)) / w.reduce((s, x) => s + x, 0) ** 2;
    expect(result.json.designEffect as number).toBeCloseTo(deff, 10);
    expect(outcome.marginOfError as number).toBeCloseTo(1.96 * Math.sqrt((deff * (outcome.weighted as number) * (1 - (outcome.weighted as number))) / n), 10);
  });
});
