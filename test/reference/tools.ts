/**
 * Runs the reference tools (R's survey package, Python's scipy) on files a test writes to a
 * temporary folder. A missing tool is a failure with the install line, never a skip.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { run } from '../../api/src/cli/run.js';

const RSCRIPT = '/usr/bin/Rscript';
const PYTHON = '/usr/bin/python3';
const INSTALL = 'apt-get install -y --no-install-recommends r-cran-survey r-cran-mass python3-scipy';

export function tempDir(): string {
  return mkdtempSync(join(tmpdir(), 'plumbline-ref-'));
}

/** Runs an R script and parses the JSON-ish numbers it prints with `cat`. */
export function runR(script: string, dir = tempDir()): string {
  if (!existsSync(RSCRIPT)) throw new Error(`${RSCRIPT} is missing: install the reference tools with ${INSTALL}`);
  const file = join(dir, 'reference.R');
  writeFileSync(file, script);
  try {
    return execFileSync(RSCRIPT, ['--vanilla', file], { cwd: dir, encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
  } catch (error) {
    throw new Error(`Rscript failed (is r-cran-survey installed? ${INSTALL}): ${(error as { stderr?: string }).stderr ?? error}`);
  }
}

export function runPython(script: string, dir = tempDir()): string {
  if (!existsSync(PYTHON)) throw new Error(`${PYTHON} is missing: install the reference tools with ${INSTALL}`);
  const file = join(dir, 'reference.py');
  writeFileSync(file, script);
  try {
    return execFileSync(PYTHON, [file], { cwd: dir, encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
  } catch (error) {
    throw new Error(`python3 with scipy failed (is python3-scipy installed? ${INSTALL}): ${(error as { stderr?: string }).stderr ?? error}`);
  }
}

/**
 * R lines that read data.csv (quota variables a, b and c, an optional base weight `base`) and
 * targets.csv from the working folder and rake them with survey::calibrate(calfun = "raking")
 * into `cal`; `prepare` is R run on `d` just after it is read.
 */
export function rRakedABC(dataColumns: string, prepare = ''): string {
  return `
suppressMessages(library(survey))
d <- read.csv("data.csv", colClasses = c(${dataColumns}))
t <- read.csv("targets.csv", colClasses = c("character", "character", "numeric"))
${prepare}
d$bw <- if ("base" %in% names(d)) d$base else 1
des <- svydesign(ids = ~1, weights = ~bw, data = d)
mm <- model.matrix(~a + b + c, d)
pop <- setNames(numeric(ncol(mm)), colnames(mm))
pop["(Intercept)"] <- sum(d$bw)
for (v in unique(t$variable)) {
  s <- t[t$variable == v, ]
  for (i in seq_len(nrow(s))) {
    name <- paste0(v, s$category[i])
    if (name %in% names(pop)) pop[name] <- s$share[i] / sum(s$share) * sum(d$bw)
  }
}
cal <- calibrate(des, ~a + b + c, population = pop, calfun = "raking", epsilon = 1e-12, maxit = 500)
`;
}

/** Runs a `plumbline` command in-process. */
export function plumbline(args: string[]): { code: number; stdout: string; stderr: string; json: Record<string, unknown> } {
  let stdout = '';
  let stderr = '';
  const code = run(args, { out: (t) => (stdout += t), err: (t) => (stderr += t) });
  return { code, stdout, stderr, json: code === 0 ? JSON.parse(stdout) : {} };
}

/** Reads a plain numeric column from a CSV our command wrote (no quoted commas in the tests' files). */
export function csvColumn(text: string, column: string): number[] {
  const [head, ...lines] = text.trim().split('\n');
  const index = (head as string).split(',').indexOf(column);
  return lines.map((l) => Number(l.split(',')[index]));
}
