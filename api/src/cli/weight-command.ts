import { parseArgs } from 'node:util';
import { EstimationInputError } from '../estimation/errors.js';
import type { RakingCell } from '../estimation/raking.js';
import { summariseWeighting } from '../estimation/weighting-summary.js';
import { readCsv, writeCsvAtomic, writeTextAtomic, type CsvTable } from './csv-files.js';
import { CliInputError } from './errors.js';
import { readTargets, type TargetsFile } from './targets-file.js';
import { integerOption, numberOption, parseNumber, required } from './values.js';

export const WEIGHT_USAGE =
  'plumbline weight --data FILE.csv --targets FILE.csv --out FILE.csv [--outcome COLUMN] [--base-weight COLUMN] ' +
  '[--max-iterations N] [--tolerance T] [--cap C] [--floor F]';

interface Cells {
  cells: (RakingCell & { successes: number; answered: number; dontKnow: number })[];
  /** Cell index of each data record; -1 for a record left out (see countedAs). */
  cellOf: Int32Array;
  /** Records left out because their `<variable>_counted_as` is empty (a retired category not weighted). */
  notWeighted: number;
}

/**
 * Values of the outcome column (any case): 1 or yes, 0 or no, and don't know or no answer,
 * which are raked but left out of the share (docs/methods.md, section 2). The interviews
 * export writes yes, no, dont_know and no_answer.
 */
const OUTCOME_VALUES: Record<string, 'yes' | 'no' | 'dont_know' | 'no_answer'> = {
  '1': 'yes', yes: 'yes', '0': 'no', no: 'no',
  dont_know: 'dont_know', "don't know": 'dont_know', no_answer: 'no_answer', 'no answer': 'no_answer',
};
const OUTCOME_EXPECTED = '1 or yes, 0 or no, dont_know or no_answer';

/**
 * The column a variable is read from: `<variable>_counted_as` when the data has it (an export
 * of a project with retired categories says there what each interview counts as, as the
 * balance does), otherwise the variable's own column.
 */
export const countedAs = (variable: string) => `${variable}_counted_as`;

/** Rakes a data file to the targets file and writes it back with a weight column. */
export function weightCommand(args: string[]): object {
  const { values } = parseArgs({
    args,
    strict: true,
    options: {
      data: { type: 'string' }, targets: { type: 'string' }, out: { type: 'string' },
      outcome: { type: 'string' }, 'base-weight': { type: 'string' },
      'max-iterations': { type: 'string' }, tolerance: { type: 'string' },
      cap: { type: 'string' }, floor: { type: 'string' },
    },
  });
  const out = required(values.out, 'out');
  const options = {
    maxIterations: integerOption(values['max-iterations'], 'max-iterations', 1),
    tolerance: numberOption(values.tolerance, 'tolerance', (x) => x > 0, 'a number above 0'),
    cap: numberOption(values.cap, 'cap', (x) => x >= 1, 'a number of at least 1 (weights have mean 1)'),
    floor: numberOption(values.floor, 'floor', (x) => x >= 0 && x <= 1, 'a number between 0 and 1 (weights have mean 1)'),
  };
  const targets = readTargets(required(values.targets, 'targets'));
  const data = readCsv(required(values.data, 'data'));
  checkColumns(data, targets, values.outcome, values['base-weight']);
  const { cells, cellOf, notWeighted } = buildCells(data, targets, values.outcome, values['base-weight']);
  checkTargetsHaveRespondents(targets, cells, data.file);

  let summary;
  try {
    summary = summariseWeighting(cells, targets.targets, options, values.outcome !== undefined);
  } catch (error) {
    if (error instanceof EstimationInputError) throw new CliInputError(error.message);
    throw error;
  }
  const weights = summary.weights;
  const weightOf = (i: number) => (cellOf[i] === -1 ? '' : (weights[cellOf[i] as number] as number));
  if (data.rawLines) {
    // No quoted fields: each input line is written back unchanged with its weight appended.
    const { header, records } = data.rawLines;
    writeTextAtomic(out, `${header},weight\n${records.map((line, i) => `${line},${weightOf(i)}`).join('\n')}\n`);
  } else {
    writeCsvAtomic(out, [...data.header, 'weight'], Array.from({ length: data.rowCount }, (_, i) => [...data.row(i), weightOf(i)]));
  }
  const { weights: _weights, outcome, ...summaryReport } = summary;
  const report = notWeighted > 0 ? { ...summaryReport, notWeighted } : summaryReport;
  return outcome ? { ...report, outcome: { column: values.outcome, ...outcome } } : report;
}

function checkColumns(data: CsvTable, targets: TargetsFile, outcome?: string, baseWeight?: string): void {
  const has = new Set(data.header);
  for (const t of targets.margins) {
    if (!has.has(t.variable)) {
      const line = targets.lineOf(t.variable, t.shares[0]?.category ?? '');
      throw new CliInputError(`${data.file}: line 1: no column "${t.variable}" (variable in ${targets.file} line ${line})`);
    }
  }
  if (outcome !== undefined && !has.has(outcome)) throw new CliInputError(`${data.file}: line 1: no column "${outcome}" (--outcome)`);
  if (baseWeight !== undefined && !has.has(baseWeight)) {
    throw new CliInputError(`${data.file}: line 1: no column "${baseWeight}" (--base-weight)`);
  }
  if (has.has('weight')) {
    throw new CliInputError(`${data.file}: line 1: already has a column "weight"; rename it (it can still be the --base-weight)`);
  }
}

/**
 * One counting pass: interviews with the same categories and base weight share a cell.
 * A cell's key is a number (mixed-radix category indices, then the base weight's index),
 * so the pass allocates next to nothing per interview.
 */
function buildCells(data: CsvTable, targets: TargetsFile, outcome?: string, baseWeight?: string): Cells {
  const variables = targets.margins.map((t) => ({ name: t.variable, index: new Map(t.shares.map((s, i) => [s.category, i])) }));
  const columns = targets.margins.map((t) => (data.header.includes(countedAs(t.variable)) ? data.header.indexOf(countedAs(t.variable)) : data.header.indexOf(t.variable)));
  const outcomeAt = outcome === undefined ? -1 : columns.push(data.header.indexOf(outcome)) - 1;
  const baseAt = baseWeight === undefined ? -1 : columns.push(data.header.indexOf(baseWeight)) - 1;
  const combinations = variables.reduce((p, v) => p * v.index.size, 1);
  const baseIndex = new Map<string, number>();
  const index = new Map<number, number>();
  const cells: Cells['cells'] = [];
  const cellOf = new Int32Array(data.rowCount);
  const values: string[] = new Array(columns.length).fill('');
  const fromCountedAs = targets.margins.map((t) => data.header.includes(countedAs(t.variable)));
  let notWeighted = 0;
  for (let i = 0; i < data.rowCount; i++) {
    data.pick(i, columns, values);
    if (variables.some((_, x) => fromCountedAs[x] && (values[x] as string).trim() === '')) {
      cellOf[i] = -1;
      notWeighted++;
      continue;
    }
    let key = 0;
    variables.forEach((v, x) => {
      const value = (values[x] as string).trim();
      const c = v.index.get(value);
      if (c === undefined) {
        throw new CliInputError(`${data.file}: line ${data.line(i)}: variable ${v.name} has category "${value}", which is not in ${targets.file}`);
      }
      key = key * v.index.size + c;
    });
    let base = 1;
    if (baseAt >= 0) {
      const text = values[baseAt] as string;
      let b = baseIndex.get(text);
      if (b === undefined) {
        const parsed = parseNumber(text);
        if (parsed === null || !(parsed > 0) || !Number.isFinite(parsed)) {
          throw new CliInputError(`${data.file}: line ${data.line(i)}: base weight ${baseWeight} is "${text}"; expected a number above 0`);
        }
        b = baseIndex.size;
        baseIndex.set(text, b);
      }
      base = parseNumber(text) as number;
      key += combinations * b;
    }
    let answer: (typeof OUTCOME_VALUES)[string] = 'yes';
    if (outcomeAt >= 0) {
      const text = (values[outcomeAt] as string).trim();
      const known = Object.hasOwn(OUTCOME_VALUES, text.toLowerCase()) ? OUTCOME_VALUES[text.toLowerCase()] : undefined;
      if (known === undefined) {
        throw new CliInputError(`${data.file}: line ${data.line(i)}: outcome ${outcome} is "${text}"; expected ${OUTCOME_EXPECTED}`);
      }
      answer = known;
    }
    let j = index.get(key);
    if (j === undefined) {
      j = cells.length;
      index.set(key, j);
      const categories = Object.fromEntries(variables.map((v, x) => [v.name, (values[x] as string).trim()]));
      cells.push({ categories, count: 0, baseWeight: base, successes: 0, answered: 0, dontKnow: 0 });
    }
    const cell = cells[j] as Cells['cells'][number];
    cell.count++;
    if (answer === 'yes') cell.successes++;
    if (answer === 'yes' || answer === 'no') cell.answered++;
    if (answer === 'dont_know') cell.dontKnow++;
    cellOf[i] = j;
  }
  return { cells, cellOf, notWeighted };
}

function checkTargetsHaveRespondents(targets: TargetsFile, cells: Cells['cells'], dataFile: string): void {
  for (const t of targets.margins) {
    const counts = new Map<string, number>();
    for (const c of cells) counts.set(c.categories[t.variable] as string, (counts.get(c.categories[t.variable] as string) ?? 0) + c.count);
    for (const s of t.shares) {
      const line = targets.lineOf(t.variable, s.category);
      const m = counts.get(s.category) ?? 0;
      if (s.share > 0 && m === 0) {
        throw new CliInputError(`${targets.file}: line ${line}: variable ${t.variable} category "${s.category}" has a target but no respondents in ${dataFile}`);
      }
      if (s.share === 0 && m > 0) {
        throw new CliInputError(`${targets.file}: line ${line}: variable ${t.variable} category "${s.category}" has a share of 0 but ${m} respondents in ${dataFile}`);
      }
    }
  }
}
