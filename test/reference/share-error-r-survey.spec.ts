import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { seeded } from '../../api/src/demo/vellmoor.js';
import { symmetricHalfWidth } from '../../api/src/estimation/share-interval.js';
import { plumbline, rRakedABC, runR, tempDir } from './tools.js';

// Reference: R survey 4.1 (Debian r-cran-survey, with r-cran-mass for calibrate):
// SE(svymean(~y, calibrate(des, ~a+b+c, population = totals, calfun = "raking"))) and
// svyciprop(~y, same design, method = "beta").
const R_CALIBRATE = `${rRakedABC('a = "character", b = "character", c = "character"')}m <- svymean(~y, cal)
ci <- attr(svyciprop(~y, cal, method = "beta"), "ci")
cat(format(c(coef(m), SE(m), ci), digits = 17), sep = "\\n")
`;

interface Case {
  n: number;
  seed: number;
  /** Probability that b copies a's level (strongly associated margins when near 1). */
  association: number;
  /** Base weights drawn from these, or none. */
  bases?: number[];
  /** Chance of y = 1. */
  yes: number;
}

function writeCase(dir: string, c: Case): void {
  const random = seeded(c.seed);
  const pick = (k: number) => `${1 + Math.floor(random() * k)}`;
  const lines = [`a,b,c,y${c.bases ? ',base' : ''}`];
  for (let i = 0; i < c.n; i++) {
    const a = pick(3);
    const b = random() < c.association ? a : pick(3);
    const cc = pick(2);
    const y = random() < c.yes * (a === '1' ? 1.6 : 0.7) * (cc === '2' ? 1.2 : 0.9) ? 1 : 0;
    const base = c.bases ? `,${c.bases[Math.floor(random() * c.bases.length)]}` : '';
    lines.push(`${a},${b},${cc},${y}${base}`);
  }
  writeFileSync(join(dir, 'data.csv'), `${lines.join('\n')}\n`);
  writeFileSync(join(dir, 'targets.csv'), [
    'variable,category,share',
    'a,1,0.2', 'a,2,0.35', 'a,3,0.45',
    'b,1,0.4', 'b,2,0.25', 'b,3,0.35',
    'c,1,0.52', 'c,2,0.48',
  ].join('\n') + '\n');
}

function compare(c: Case): { weighted: number; interval: [number, number] } {
  const dir = tempDir();
  writeCase(dir, c);
  const args = ['weight', '--data', join(dir, 'data.csv'), '--targets', join(dir, 'targets.csv'), '--out', join(dir, 'out.csv'),
    '--outcome', 'y', '--tolerance', '1e-13', '--max-iterations', '5000', ...(c.bases ? ['--base-weight', 'base'] : [])];
  const result = plumbline(args);
  expect(result.code).toBe(0);
  expect(result.json.converged).toBe(true);
  const outcome = result.json.outcome as { weighted: number; standardError: number; interval: [number, number] };
  const [share, se, lower, upper] = runR(R_CALIBRATE, dir).trim().split('\n').map(Number) as [number, number, number, number];
  const relative = (x: number, r: number) => Math.abs(x - r) / Math.abs(r);
  // Reference: survey 4.1 svymean on calibrate(calfun = "raking"): share and its standard error.
  expect(relative(outcome.weighted, share)).toBeLessThan(1e-6);
  expect(relative(outcome.standardError, se)).toBeLessThan(1e-6);
  // Reference: survey 4.1 svyciprop(method = "beta") on the same calibrated design.
  expect(relative(outcome.interval[0], lower)).toBeLessThan(1e-6);
  expect(relative(outcome.interval[1], upper)).toBeLessThan(1e-6);
  return outcome;
}

describe('standard error and interval of the weighted share against R survey 4.1 calibrate', () => {
  it('matches on three loosely related margins without base weights', () => {
    compare({ n: 900, seed: 31, association: 0.1, yes: 0.3 });
  });

  it('matches when two margins are strongly associated (b copies a for 85% of interviews)', () => {
    compare({ n: 1200, seed: 47, association: 0.85, yes: 0.25 });
  });

  it('matches with non-constant base weights', () => {
    compare({ n: 700, seed: 53, association: 0.3, bases: [0.6, 1, 1.7, 3.2], yes: 0.35 });
  });

  it('matches for a rare outcome, where the interval is far from symmetric', () => {
    const outcome = compare({ n: 400, seed: 61, association: 0.5, bases: [1, 2.5], yes: 0.025 });
    expect(symmetricHalfWidth(outcome.weighted, ...outcome.interval)).toBeNull();
  });
});
