import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { seeded } from '../../api/src/demo/vellmoor.js';
import { plumbline, rRakedABC, runR, tempDir } from './tools.js';

// The headline share is yes among those who answered yes or no, while every complete is
// raked (docs/methods.md, section 2). Reference: R survey 4.1 (Debian r-cran-survey, with
// r-cran-mass for calibrate): svyratio(~yes, ~answered, calibrate(des, ~a+b+c, population =
// totals, calfun = "raking")) for the ratio and its standard error, and
// svyciprop(~yes, subset(calibrated design, answered == 1), method = "beta") for the
// Korn–Graubard interval (a domain mean is the same ratio, with the same linearised error).
const R_RATIO = `${rRakedABC('a = "character", b = "character", c = "character", answer = "character"', `d$yes <- as.numeric(d$answer == "yes")
d$answered <- as.numeric(d$answer %in% c("yes", "no"))`)}r <- svyratio(~yes, ~answered, cal)
ci <- attr(svyciprop(~yes, subset(cal, answered == 1), method = "beta"), "ci")
cat(format(c(coef(r), SE(r), ci), digits = 17), sep = "\\n")
`;

interface Case {
  n: number;
  seed: number;
  /** Chance of yes among those who answer. */
  yes: number;
  /** Chance of don't know, and of no answer. */
  dontKnow: number;
  noAnswer: number;
  bases?: number[];
}

function writeCase(dir: string, c: Case): void {
  const random = seeded(c.seed);
  const pick = (k: number) => `${1 + Math.floor(random() * k)}`;
  const lines = [`a,b,c,answer${c.bases ? ',base' : ''}`];
  for (let i = 0; i < c.n; i++) {
    const a = pick(3);
    const b = random() < 0.4 ? a : pick(3);
    const cc = pick(2);
    // Don't know leans on a (older people say it more often here), so leaving it out matters.
    const r = random();
    const dk = c.dontKnow * (a === '3' ? 1.8 : 0.6);
    const answer = r < dk ? 'dont_know' : r < dk + c.noAnswer ? 'no_answer'
      : random() < c.yes * (a === '1' ? 1.5 : 0.8) * (cc === '2' ? 1.2 : 0.9) ? 'yes' : 'no';
    const base = c.bases ? `,${c.bases[Math.floor(random() * c.bases.length)]}` : '';
    lines.push(`${a},${b},${cc},${answer}${base}`);
  }
  writeFileSync(join(dir, 'data.csv'), `${lines.join('\n')}\n`);
  writeFileSync(join(dir, 'targets.csv'), [
    'variable,category,share',
    'a,1,0.2', 'a,2,0.35', 'a,3,0.45',
    'b,1,0.4', 'b,2,0.25', 'b,3,0.35',
    'c,1,0.52', 'c,2,0.48',
  ].join('\n') + '\n');
}

function compare(c: Case): void {
  const dir = tempDir();
  writeCase(dir, c);
  const args = ['weight', '--data', join(dir, 'data.csv'), '--targets', join(dir, 'targets.csv'), '--out', join(dir, 'out.csv'),
    '--outcome', 'answer', '--tolerance', '1e-13', '--max-iterations', '5000', ...(c.bases ? ['--base-weight', 'base'] : [])];
  const result = plumbline(args);
  expect(result.code).toBe(0);
  expect(result.json.converged).toBe(true);
  const outcome = result.json.outcome as { weighted: number; standardError: number; interval: [number, number]; answered: number };
  if (c.dontKnow + c.noAnswer > 0) expect(outcome.answered).toBeLessThan(result.json.n as number);
  const [ratio, se, lower, upper] = runR(R_RATIO, dir).trim().split('\n').map(Number) as [number, number, number, number];
  const relative = (x: number, r: number) => Math.abs(x - r) / Math.abs(r);
  // Reference: survey 4.1 svyratio(~yes, ~answered) on calibrate(calfun = "raking"): ratio and SE.
  expect(relative(outcome.weighted, ratio)).toBeLessThan(1e-6);
  expect(relative(outcome.standardError, se)).toBeLessThan(1e-6);
  // Reference: survey 4.1 svyciprop(method = "beta") on the answered domain of the same design.
  expect(relative(outcome.interval[0], lower)).toBeLessThan(1e-6);
  expect(relative(outcome.interval[1], upper)).toBeLessThan(1e-6);
}

describe('headline share over those who answered, against R survey 4.1 svyratio on a raked design', () => {
  it('matches with 15% don\'t know and 5% no answer', () => {
    compare({ n: 900, seed: 71, yes: 0.35, dontKnow: 0.15, noAnswer: 0.05 });
  });

  it('matches with non-constant base weights', () => {
    compare({ n: 700, seed: 73, yes: 0.3, dontKnow: 0.1, noAnswer: 0.03, bases: [0.6, 1, 1.7, 3.2] });
  });

  it('matches the plain weighted share when everyone answered yes or no', () => {
    compare({ n: 500, seed: 79, yes: 0.4, dontKnow: 0, noAnswer: 0 });
  });
});
