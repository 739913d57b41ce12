// Population targets as text: `variable,category,share`, one category a line; a variable
// written "age band × sex" with categories "18-24 × female" gives joint shares of interlocked
// variables. Shared by the API (uploaded files) and the `plumbline` command line (files on disk).
import { parse } from 'csv-parse/sync';
import { JOINT_SEPARATOR } from '../estimation/joint-names.js';
import { MAX_SHARE, parseNumber } from './numbers.js';

export interface TargetShare {
  category: string;
  share: number;
}

export interface TargetVariable {
  variable: string;
  shares: TargetShare[];
}

export interface ParsedTargets {
  targets: TargetVariable[];
  /** Line of a variable's category row, for messages. */
  lineOf(variable: string, category: string): number;
}

/** A problem in a targets file; the message names the source, line and what is wrong. */
export class TargetsFormatError extends Error {}

const COLUMNS = ['variable', 'category', 'share'] as const;

/**
 * Reads a share: "0.25", "25", "25%", and with semicolon files also the decimal comma "0,25".
 * A percent sign changes nothing (shares are normalised per variable) but is remembered, so a
 * variable that mixes "30%" with "0.7" is refused rather than read as 30 and 0.7.
 */
function parseShare(text: string, decimalComma: boolean): { value: number; percent: boolean } | null {
  let t = text.trim();
  const percent = t.endsWith('%');
  if (percent) t = t.slice(0, -1).trim();
  const value = parseNumber(decimalComma && /^\d+,\d+$/.test(t) ? t.replace(',', '.') : t);
  return value !== null && Number.isFinite(value) ? { value, percent } : null;
}

/** The CSV reader's own message, in the product's words where we know the case. */
function plainParseError(error: Error): string {
  const line = (error as Error & { lines?: number }).lines ?? /line (\d+)/.exec(error.message)?.[1];
  const where = line ? `line ${line}: ` : '';
  if (/Quote Not Closed|quote/i.test(error.message)) return `${where}a double quote is opened and never closed`;
  return `${where}the file could not be read as CSV (${error.message.replace(/\s+/g, ' ')})`;
}

/** Picks the delimiter from the header line: a semicolon file has no comma in its header. */
function detectDelimiter(text: string): ',' | ';' {
  const header = text.split(/\r?\n/, 1)[0] ?? '';
  return header.includes(';') && !header.includes(',') ? ';' : ',';
}

/**
 * Parses a targets file (UTF-8, with or without BOM, comma or semicolon separated).
 * Shares may be any non-negative numbers (counts too); they are normalised per variable
 * by whoever uses them. Every problem throws with the source and line.
 */
export function parseTargetsCsv(text: string, source: string): ParsedTargets {
  const body = text.replace(/^\uFEFF/, '');
  if (body.trim() === '') throw new TargetsFormatError(`${source}: file is empty`);
  const delimiter = detectDelimiter(body);
  let rows: { record: string[]; info: { lines: number } }[];
  try {
    // Blank rows, and the rows of separators alone (";;") that spreadsheets write, are skipped;
    // the number of fields per row is checked below, in our own words.
    rows = parse(body, { delimiter, skip_empty_lines: true, skip_records_with_empty_values: true, info: true, relax_column_count: true }) as unknown as typeof rows;
  } catch (error) {
    throw new TargetsFormatError(`${source}: ${plainParseError(error as Error)}`);
  }
  const [head, ...records] = rows;
  if (!head) throw new TargetsFormatError(`${source}: file is empty`);
  const header = head.record.map((h) => h.trim().toLowerCase());
  const twice = header.find((h, i) => header.indexOf(h) !== i);
  if (twice !== undefined) throw new TargetsFormatError(`${source}: line ${head.info.lines}: column "${twice}" is given twice`);
  for (const column of COLUMNS) {
    if (!header.includes(column)) {
      throw new TargetsFormatError(`${source}: line ${head.info.lines}: missing column "${column}" (expected variable${delimiter}category${delimiter}share)`);
    }
  }
  const extra = header.find((h) => !(COLUMNS as readonly string[]).includes(h));
  if (extra !== undefined) throw new TargetsFormatError(`${source}: line ${head.info.lines}: unexpected column "${extra}"`);
  if (records.length === 0) throw new TargetsFormatError(`${source}: no rows after the header line`);
  const [iv, ic, is] = COLUMNS.map((c) => header.indexOf(c)) as [number, number, number];
  for (const { record, info } of records) {
    if (record.length !== header.length) {
      throw new TargetsFormatError(
        `${source}: line ${info.lines}: has ${record.length} ${record.length === 1 ? 'field' : 'fields'}; every row needs ${header.length} ` +
          `(${head.record.map((h) => h.trim()).join(delimiter)})${delimiter === ',' ? ', so a comma inside a name needs the name in double quotes' : ''}`,
      );
    }
  }
  const percentSigns = new Map<string, { with: number; without: number; line: number }>();

  const byVariable = new Map<string, TargetShare[]>();
  const lines = new Map<string, number>();
  const partLines = new Map<string, number>();
  for (const { record, info } of records) {
    const line = info.lines;
    const variable = (record[iv] ?? '').trim();
    const category = (record[ic] ?? '').trim();
    const text = record[is] ?? '';
    if (variable === '') throw new TargetsFormatError(`${source}: line ${line}: variable is empty`);
    if (category === '') throw new TargetsFormatError(`${source}: line ${line}: variable ${variable}: category is empty`);
    const read = parseShare(text, delimiter === ';');
    const share = read?.value ?? null;
    if (share === null || share < 0) {
      throw new TargetsFormatError(
        `${source}: line ${line}: variable ${variable} category "${category}": share "${text.trim()}" is not a non-negative number`,
      );
    }
    if (share > MAX_SHARE) {
      throw new TargetsFormatError(`${source}: line ${line}: variable ${variable} category "${category}": share ${text.trim()} is larger than ${MAX_SHARE}`);
    }
    const key = JSON.stringify([variable, category]);
    if (lines.has(key)) {
      throw new TargetsFormatError(
        `${source}: line ${line}: variable ${variable} category "${category}" is given twice (first on line ${lines.get(key)})`,
      );
    }
    lines.set(key, line);
    // A joint row ("age band × sex", "18-24 × female") also locates each of its variables' categories.
    const parts = variable.split(JOINT_SEPARATOR);
    const values = category.split(JOINT_SEPARATOR);
    if (parts.length > 1 && parts.length === values.length) {
      parts.forEach((part, v) => {
        const partKey = JSON.stringify([part.trim(), (values[v] as string).trim()]);
        if (!partLines.has(partKey)) partLines.set(partKey, line);
      });
    }
    const signs = percentSigns.get(variable) ?? { with: 0, without: 0, line };
    if (read?.percent) signs.with++;
    else signs.without++;
    percentSigns.set(variable, signs);
    if (signs.with > 0 && signs.without > 0) {
      throw new TargetsFormatError(`${source}: line ${line}: variable ${variable}: some shares have a % sign and some do not; write them all one way`);
    }
    const list = byVariable.get(variable) ?? [];
    list.push({ category, share });
    byVariable.set(variable, list);
  }
  for (const [variable, shares] of byVariable) {
    if (shares.every((s) => s.share === 0)) {
      const line = lines.get(JSON.stringify([variable, shares[0]?.category]));
      throw new TargetsFormatError(`${source}: line ${line}: variable ${variable}: all shares are zero`);
    }
  }
  return {
    targets: [...byVariable].map(([variable, shares]) => ({ variable, shares })),
    lineOf: (variable, category) => {
      const key = JSON.stringify([variable, category]);
      return lines.get(key) ?? partLines.get(key) ?? 0;
    },
  };
}
