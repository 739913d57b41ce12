import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { plumbline, tempDir } from './tools.js';

/**
 * AAPOR Standard Definitions, 9th edition (2016), "Calculating rates from response
 * distributions"; the formulas are applied by hand below (recalled from memory; the COOP
 * formulas agree with the association's own correction notice citing AAPOR 2016: 63).
 * Case: I 400, P 50, R 200, NC 150, O 30, UH 100, UO 70, NE 100.
 * Eligible (I+P+R+NC+O) = 830, unknown (UH+UO) = 170, contacted (I+P+R+O) = 680.
 */
describe('AAPOR outcome rates worked by hand', () => {
  const dir = tempDir();
  const file = join(dir, 'dispositions.csv');
  writeFileSync(file, 'code,count\nI,400\nP,50\nR,200\nNC,150\nO,30\nUH,100\nUO,70\nNE,100\n');

  it('computes every rate with e defaulting to the eligible share of resolved cases (830/930)', () => {
    const result = plumbline(['rates', '--input', file]);
    expect(result.code).toBe(0);
    const r = result.json as Record<string, number>;
    const e = 830 / 930;
    const expected: Record<string, number> = {
      e,
      RR1: 400 / 1000, RR2: 450 / 1000, RR3: 400 / (830 + e * 170), RR4: 450 / (830 + e * 170), RR5: 400 / 830, RR6: 450 / 830,
      COOP1: 400 / 680, COOP2: 450 / 680, COOP3: 400 / 650, COOP4: 450 / 650,
      REF1: 200 / 1000, REF2: 200 / (830 + e * 170), REF3: 200 / 830,
      CON1: 680 / 1000, CON2: 680 / (830 + e * 170), CON3: 680 / 830,
    };
    for (const [name, value] of Object.entries(expected)) expect(r[name], name).toBeCloseTo(value, 12);
  });

  it('uses a given e: RR3 with e = 0.5 is 400 / (830 + 85)', () => {
    const r = plumbline(['rates', '--input', file, '--e', '0.5']).json as Record<string, number>;
    expect(r.RR3).toBeCloseTo(400 / 915, 12);
    expect(r.CON2).toBeCloseTo(680 / 915, 12);
  });
});
