/**
 * `npm run bench:next-interviews`: "where the next interviews help most" in memory, the
 * computation GET /projects/:id/next-interviews does once the counts are read: the seeded
 * Vellmoor mix (age band × sex interlocked, region and education as margins) at BENCH_ROWS
 * completes (default 1,000) of a target 20% above them, plans of 1, 50 and 200 interviews.
 * Reports the median of 5 runs of each.
 */
import { performance } from 'node:perf_hooks';
import { drawRespondent, seeded, VELLMOOR_TARGETS } from '../api/src/demo/vellmoor.js';
import { nextInterviews, type EffortQuotaCell } from '../api/src/estimation/next-interviews.js';
import { allocateQuotas } from '../api/src/estimation/quotas.js';
import type { MarginTarget, RakingCell } from '../api/src/estimation/raking.js';

const N = Number(process.env.BENCH_ROWS ?? 1_000);
const random = seeded(2026);
const groups = new Map<string, RakingCell>();
for (let i = 0; i < N; i++) {
  const { categories } = drawRespondent(random);
  const key = JSON.stringify(categories);
  const cell = groups.get(key) ?? { categories, count: 0 };
  cell.count++;
  groups.set(key, cell);
}
const cells = [...groups.values()];
const targets: MarginTarget[] = Object.entries(VELLMOOR_TARGETS).map(([variable, shares]) => ({
  variable,
  shares: Object.entries(shares).map(([category, share]) => ({ category, share })),
}));
const allocation = allocateQuotas(targets, Math.round(N * 1.2), { interlock: ['age_band', 'sex'] });
const quotaCells: EffortQuotaCell[] = allocation.sets.flatMap((set) => set.cells.map((c) => {
  const label = Object.entries(c.categories).map(([v, k]) => `${v}: ${k}`).join(' × ');
  const achieved = cells.filter((x) => Object.entries(c.categories).every(([v, k]) => x.categories[v] === k)).reduce((s, x) => s + x.count, 0);
  return { id: label, label, categories: c.categories, target: c.target, achieved };
}));

for (const count of [1, 50, 200]) {
  const times: number[] = [];
  let planned = 0;
  for (let run = 0; run < 5; run++) {
    const t0 = performance.now();
    planned = nextInterviews(cells, targets, quotaCells, count).planned;
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  console.log(`${N.toLocaleString('en-GB')} completes in ${cells.length} weighting cells, ${quotaCells.length} quota cells: plan of ${count} (${planned} placed) in ${times[2]!.toFixed(1)} ms (median of 5)`);
}
