/**
 * The invented Vellmoor scenario: population targets for a survey on extending the tram
 * line, how the achieved sample leans away from them, and a model of support for the
 * extension. Used by the demo seed and the benchmark data generator. All of it is made up.
 */

export const VELLMOOR_TARGETS: Record<string, Record<string, number>> = {
  age_band: { '18-24': 11, '25-34': 17, '35-44': 16, '45-54': 17, '55-64': 16, '65+': 23 },
  sex: { female: 51, male: 49 },
  region: { Harrowby: 28, 'Kestle Vale': 19, Mardon: 22, 'Old Quay': 17, Tarnholm: 14 },
  education: { basic: 18, secondary: 37, vocational: 21, degree: 24 },
};

/**
 * Joint age band × sex shares (percent), as a census table gives them: they sum to the age
 * margins above and to 51% women, with more women than men among the over-65s. The demo
 * project's interlocked cells take these; docs/examples/vellmoor-targets-joint.csv holds the same.
 */
export const VELLMOOR_AGE_SEX: Record<string, { female: number; male: number }> = {
  '18-24': { female: 5.4, male: 5.6 },
  '25-34': { female: 8.4, male: 8.6 },
  '35-44': { female: 8, male: 8 },
  '45-54': { female: 8.5, male: 8.5 },
  '55-64': { female: 8.1, male: 7.9 },
  '65+': { female: 12.6, male: 10.4 },
};

/** How the achieved sample leans away from the targets (relative response propensity). */
export const VELLMOOR_LEAN: Record<string, Record<string, number>> = {
  age_band: { '18-24': 0.6, '25-34': 0.8, '35-44': 1, '45-54': 1.1, '55-64': 1.3, '65+': 1.2 },
  sex: { female: 1.15, male: 0.85 },
  region: { Harrowby: 1.3, 'Kestle Vale': 0.8, Mardon: 1, 'Old Quay': 0.9, Tarnholm: 0.7 },
  education: { basic: 0.6, secondary: 0.9, vocational: 1, degree: 1.5 },
};

/** Mulberry32: a small seeded generator, so the same seed gives the same data. */
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

export function draw(random: () => number, weights: Record<string, number>): string {
  const entries = Object.entries(weights);
  const total = entries.reduce((s, [, w]) => s + w, 0);
  let u = random() * total;
  for (const [key, w] of entries) {
    u -= w;
    if (u <= 0) return key;
  }
  return (entries[entries.length - 1] as [string, number])[0];
}

export interface Respondent {
  categories: Record<string, string>;
  supports: boolean;
}

/** One invented respondent, drawn from the leaning sample. */
export function drawRespondent(random: () => number): Respondent {
  const categories: Record<string, string> = {};
  for (const [variable, shares] of Object.entries(VELLMOOR_TARGETS)) {
    const lean = VELLMOOR_LEAN[variable] as Record<string, number>;
    categories[variable] = draw(random, Object.fromEntries(Object.entries(shares).map(([c, s]) => [c, s * (lean[c] ?? 1)])));
  }
  // Support for the extension: higher among the young, in Harrowby and among graduates.
  const young = categories.age_band === '18-24' || categories.age_band === '25-34' ? 0.12 : 0;
  const town = categories.region === 'Harrowby' ? 0.1 : categories.region === 'Tarnholm' ? -0.1 : 0;
  const degree = categories.education === 'degree' ? 0.08 : 0;
  return { categories, supports: random() < 0.42 + young + town + degree };
}
