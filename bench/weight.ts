/**
 * `npm run bench:weight`: end-to-end `plumbline weight` (read, rake, write) run as the README
 * tells analysts to run it (the binary on the PATH after `npm link -w api`, i.e. api/bin/plumbline.js
 * started through its `#!/usr/bin/env node` line), and through `npx` for comparison, against Rscript
 * doing the same with survey::rake, on a generated 200,000-row Vellmoor file with four
 * margins at tolerance 1e-9. Reports wall time, peak memory (GNU time's maximum resident
 * set size) and the largest weight difference, plus the in-process raking time at 20,000 and
 * 200,000 rows to show that raking works on cells, not rows, and the start-up of a small
 * command (`posterior`) both ways. Files go to bench/out/.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { rake, type RakingCell } from '../api/src/estimation/raking.js';
import { generateRows, VELLMOOR_TARGETS, writeFiles } from './generate-data.js';

const ROWS = Number(process.env.BENCH_ROWS ?? 200_000);
const root = join(import.meta.dirname, '..');
const out = join(root, 'bench/out');
mkdirSync(out, { recursive: true });
for (const tool of ['/usr/bin/Rscript', '/usr/bin/time']) {
  if (!existsSync(tool)) throw new Error(`${tool} is missing (apt-get install -y --no-install-recommends r-cran-survey time)`);
}

const data = join(out, 'data.csv');
const targets = join(out, 'targets.csv');
writeFiles(ROWS, 2024, data, targets);

console.log('building the api (tsc -p api/tsconfig.build.json) so the command runs compiled code ...');
execFileSync(process.execPath, [join(root, 'node_modules/typescript/bin/tsc'), '-p', join(root, 'api/tsconfig.build.json')], { stdio: 'inherit' });

/** Runs a command under GNU time; returns wall seconds and peak resident memory in MiB. */
function measure(command: string, args: string[]): { seconds: number; peakMiB: number; stdout: string } {
  const start = performance.now();
  const result = spawnSync('/usr/bin/time', ['-f', '%M', command, ...args], { cwd: root, encoding: 'utf8', maxBuffer: 64 << 20 });
  const seconds = (performance.now() - start) / 1000;
  if (result.status !== 0) throw new Error(`${command} failed: ${result.stderr}`);
  const kib = Number(result.stderr.trim().split('\n').at(-1));
  return { seconds, peakMiB: kib / 1024, stdout: result.stdout };
}

/** What `plumbline` on the PATH runs: the linked file itself, started by the kernel through its shebang line. */
const binary = join(root, 'api/bin/plumbline.js');
const weightArgs = (file: string) => ['weight', '--data', data, '--targets', targets, '--out', join(out, file), '--tolerance', '1e-9', '--max-iterations', '1000'];
const ours = measure(binary, weightArgs('plumbline-weighted.csv'));
const report = JSON.parse(ours.stdout);
const throughNpx = measure('npx', ['--no-install', 'plumbline', ...weightArgs('plumbline-npx-weighted.csv')]);

/** Median wall time in ms of `runs` starts of a small command (start-up, not work, dominates). */
function startUp(command: string, args: string[], runs = 11): number {
  const times = Array.from({ length: runs }, () => measure(command, args).seconds * 1000).sort((x, y) => x - y);
  return times[Math.floor(runs / 2)] as number;
}
const posterior = ['posterior', '--successes', '62', '--trials', '100'];
const startUpLinked = startUp(binary, posterior);
const startUpNpx = startUp('npx', ['--no-install', 'plumbline', ...posterior]);

const rScript = join(out, 'rake.R');
writeFileSync(rScript, `
suppressMessages(library(survey))
d <- read.csv("${data}", stringsAsFactors = FALSE, check.names = FALSE)
t <- read.csv("${targets}", stringsAsFactors = FALSE, colClasses = c("character", "character", "numeric"))
d$one <- 1
n <- nrow(d)
vars <- unique(t$variable)
pops <- lapply(vars, function(v) {
  s <- t[t$variable == v, ]
  df <- data.frame(s$category, s$share / sum(s$share) * n, stringsAsFactors = FALSE)
  names(df) <- c(v, "Freq")
  df
})
forms <- lapply(vars, function(v) as.formula(paste0("~\`", v, "\`")))
des <- svydesign(ids = ~1, weights = ~one, data = d)
r <- rake(des, forms, pops, control = list(maxit = 1000, epsilon = 1e-9))
d$weight <- weights(r) / mean(weights(r))
d$one <- NULL
write.csv(d, "${join(out, 'r-weighted.csv')}", row.names = FALSE)
`);
const theirs = measure('/usr/bin/Rscript', ['--vanilla', rScript]);

const lastColumn = (file: string) => readFileSync(file, 'utf8').trim().split('\n').slice(1).map((l) => Number(l.slice(l.lastIndexOf(',') + 1)));
const a = lastColumn(join(out, 'plumbline-weighted.csv'));
const b = lastColumn(join(out, 'r-weighted.csv'));
if (a.length !== b.length) throw new Error(`row counts differ: ${a.length} vs ${b.length}`);
const maxDifference = a.reduce((m, w, i) => Math.max(m, Math.abs(w - (b[i] as number))), 0);

/** In-process raking on the aggregated cells of the first `rows` interviews (counting pass excluded). */
function rakeOnly(rows: number): { cells: number; ms: number } {
  const variables = Object.keys(VELLMOOR_TARGETS);
  const counts = new Map<string, RakingCell>();
  for (const r of generateRows(rows, 2024)) {
    const key = r.slice(1, 5).join('|');
    const cell = counts.get(key) ?? { categories: Object.fromEntries(variables.map((v, i) => [v, r[i + 1] as string])), count: 0 };
    cell.count++;
    counts.set(key, cell);
  }
  const cells = [...counts.values()];
  const targetList = Object.entries(VELLMOOR_TARGETS).map(([variable, shares]) => ({
    variable,
    shares: Object.entries(shares).map(([category, share]) => ({ category, share })),
  }));
  const start = performance.now();
  for (let i = 0; i < 20; i++) rake(cells, targetList, { tolerance: 1e-9, maxIterations: 1000 });
  return { cells: cells.length, ms: (performance.now() - start) / 20 };
}
const small = rakeOnly(ROWS / 10);
const large = rakeOnly(ROWS);

const fmt = (x: number, digits = 2) => x.toFixed(digits);
console.log(`
| ${ROWS.toLocaleString('en')} rows, 4 margins, tolerance 1e-9 | wall time | peak memory |
|---|---|---|
| plumbline weight (on the PATH; node ${process.versions.node}) | ${fmt(ours.seconds)} s | ${fmt(ours.peakMiB, 0)} MiB |
| npx plumbline weight | ${fmt(throughNpx.seconds)} s | ${fmt(throughNpx.peakMiB, 0)} MiB |
| Rscript + survey::rake | ${fmt(theirs.seconds)} s | ${fmt(theirs.peakMiB, 0)} MiB |

speed-up: ${fmt(theirs.seconds / ours.seconds, 1)}x; largest weight difference: ${maxDifference.toExponential(2)}; ` +
  `plumbline converged: ${report.converged} in ${report.iterations} sweeps
raking alone on aggregated cells: ${fmt(small.ms, 3)} ms for ${(ROWS / 10).toLocaleString('en')} rows (${small.cells} cells), ` +
  `${fmt(large.ms, 3)} ms for ${ROWS.toLocaleString('en')} rows (${large.cells} cells)
start-up, median of 11 runs of \`plumbline posterior\`: ${fmt(startUpLinked, 0)} ms on the PATH, ${fmt(startUpNpx, 0)} ms through npx`);
if (maxDifference > 1e-6) {
  console.error('weights differ from survey::rake by more than 1e-6');
  process.exitCode = 1;
}
