// The demo's benchmarks: three invented published polls on the tram extension in Vellmoor, from
// two method groups (a telephone poll taken as unbiased, two waves of an online panel whose bias
// is unknown), so the Benchmarks page shows a reconciliation after `npm start`. All made up.
import type { Knex } from 'knex';

const DAY = 86_400_000;
const isoDay = (t: number) => new Date(t).toISOString().slice(0, 10);

export async function seedBenchmarks(db: Knex, projectId: string, today: number): Promise<void> {
  const day = (offset: number) => isoDay(Math.floor(today / DAY) * DAY + offset * DAY);
  await db('benchmark_groups').insert([
    { project_id: projectId, name: 'Telephone (random digit)', bias_kind: 'none', bias_factor: null },
    { project_id: projectId, name: 'Online panel', bias_kind: 'unknown', bias_factor: null },
  ]);
  await db('benchmark_polls').insert([
    { project_id: projectId, source: 'Vellmoor Courier / Harrow Polling', field_start: day(-14), field_end: day(-11), method_group: 'Telephone (random digit)', yes: 445, sample_size: 902 },
    { project_id: projectId, source: 'Eastline Panel, wave 1', field_start: day(-12), field_end: day(-10), method_group: 'Online panel', yes: 781, sample_size: 1504 },
    { project_id: projectId, source: 'Eastline Panel, wave 2', field_start: day(-5), field_end: day(-3), method_group: 'Online panel', yes: 805, sample_size: 1498 },
  ]);
}
