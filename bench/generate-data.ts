/**
 * Writes invented interview files for the fictional county of Vellmoor: a data CSV with
 * four quota variables and a 0/1 outcome, and the matching targets CSV. The sample mix is
 * deliberately off the targets so raking has work to do. Deterministic (seeded), no I/O
 * beyond the two files named on the command line.
 *
 *   npx tsx bench/generate-data.ts ROWS SEED DATA.csv TARGETS.csv
 */
import { writeFileSync } from 'node:fs';

export const VELLMOOR_TARGETS: Record<string, Record<string, number>> = {
  age_band: { '18-24': 11, '25-34': 17, '35-44': 16, '45-54': 17, '55-64': 16, '65+': 23 },
  sex: { female: 51, male: 49 },
  region: { Harrowby: 28, 'Kestle Vale': 19, Mardon: 22, 'Old Quay': 17, Tarnfield: 14 },
  education: { basic: 18, secondary: 37, vocational: 21, degree: 24 },
};

/** How the achieved sample leans away from the targets (relative response propensity). */
const LEAN: Record<string, Record<string, number>> = {
  age_band: { '18-24': 0.6, '25-34': 0.8, '35-44': 1, '45-54': 1.1, '55-64': 1.3, '65+': 1.2 },
  sex: { female: 1.15, male: 0.85 },
  region: { Harrowby: 1.3, 'Kestle Vale': 0.8, Mardon: 1, 'Old Quay': 0.9, Tarnfield: 0.7 },
  education: { basic: 0.6, secondary: 0.9, vocational: 1, degree: 1.5 },
};

/** Mulberry32: a small seeded generator, so the same seed gives the same file. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function draw(random: () => number, weights: Record<string, number>): string {
  const entries = Object.entries(weights);
  const total = entries.reduce((s, [, w]) => s + w, 0);
  let u = random() * total;
  for (const [key, w] of entries) {
    u -= w;
    if (u <= 0) return key;
  }
  return (entries[entries.length - 1] as [string, number])[0];
}

export function generateRows(rows: number, seed: number): string[][] {
  const random = seeded(seed);
  const variables = Object.keys(VELLMOOR_TARGETS);
  const out: string[][] = [];
  for (let i = 0; i < rows; i++) {
    const record = variables.map((v) => {
      const leaning = Object.fromEntries(
        Object.entries(VELLMOOR_TARGETS[v] as Record<string, number>).map(([c, s]) => [c, s * ((LEAN[v] as Record<string, number>)[c] ?? 1)]),
      );
      return draw(random, leaning);
    });
    // Support for the tram extension: higher among the young, in Harrowby and among graduates.
    const young = record[0] === '18-24' || record[0] === '25-34' ? 0.12 : 0;
    const town = record[2] === 'Harrowby' ? 0.1 : record[2] === 'Tarnfield' ? -0.1 : 0;
    const degree = record[3] === 'degree' ? 0.08 : 0;
    const supports = random() < 0.42 + young + town + degree ? '1' : '0';
    out.push([`V${String(i + 1).padStart(6, '0')}`, ...record, supports]);
  }
  return out;
}

export function writeFiles(rows: number, seed: number, dataFile: string, targetsFile: string): void {
  const header = ['interview_id', ...Object.keys(VELLMOOR_TARGETS), 'supports_tram'];
  const body = generateRows(rows, seed).map((r) => r.map((v) => (v.includes(',') ? `"${v}"` : v)).join(','));
  writeFileSync(dataFile, `${[header.join(','), ...body].join('\n')}\n`);
  const targets = Object.entries(VELLMOOR_TARGETS).flatMap(([v, shares]) => Object.entries(shares).map(([c, s]) => `${v},${c},${s}`));
  writeFileSync(targetsFile, `${['variable,category,share', ...targets].join('\n')}\n`);
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const [rows, seed, dataFile, targetsFile] = process.argv.slice(2);
  if (!rows || !seed || !dataFile || !targetsFile) {
    console.error('usage: npx tsx bench/generate-data.ts ROWS SEED DATA.csv TARGETS.csv');
    process.exit(2);
  }
  writeFiles(Number(rows), Number(seed), dataFile, targetsFile);
}
