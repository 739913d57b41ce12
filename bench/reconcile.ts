/**
 * `npm run bench:reconcile`: one reconciliation of 10 polls in 3 method groups (one without
 * bias, two of unknown bias), the case the project's Benchmarks page and a per-day history
 * run, in process (no start-up). Prints the median and slowest of 20 runs after a warm-up.
 */
import { performance } from 'node:perf_hooks';
import { reconcile, type ReconcileInput } from '../api/src/estimation/reconcile.js';

const input: ReconcileInput = {
  groups: [{ id: 'phone', bias: { kind: 'none' } }, { id: 'panel', bias: { kind: 'unknown' } }, { id: 'project', bias: { kind: 'unknown' } }],
  polls: Array.from({ length: 10 }, (_, i) => ({ id: `p${i}`, group: ['phone', 'panel', 'project'][i % 3] as string, successes: 400 + i * 7, trials: 900 + i * 11 })),
};

reconcile(input);
const times: number[] = [];
for (let i = 0; i < 20; i++) {
  const start = performance.now();
  reconcile(input);
  times.push(performance.now() - start);
}
times.sort((a, b) => a - b);
const median = ((times[9] as number) + (times[10] as number)) / 2;
console.log(`reconcile, 10 polls in 3 groups (2 unknown): median ${median.toFixed(1)} ms, slowest ${(times[19] as number).toFixed(1)} ms`);
console.log(JSON.stringify(reconcile(input).truth));
