import { randomBytes } from 'node:crypto';
import { readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, basename } from 'node:path';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { CliInputError } from './errors.js';

export interface CsvTable {
  file: string;
  header: string[];
  /** Number of records after the header. */
  rowCount: number;
  /** Line in the file where record i (0-based, after the header) ends. */
  line(i: number): number;
  /** All fields of record i. */
  row(i: number): string[];
  /** Fills `out` with the fields of record i in the given columns, without splitting the whole record. */
  pick(i: number, columns: readonly number[], out: string[]): void;
  /** The header and record lines exactly as read, when the file has no quoted fields; else null. */
  rawLines: { header: string; records: string[] } | null;
}

export function readText(file: string): string {
  try {
    return readFileSync(file, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    throw new CliInputError(`${file}: cannot be read (${code === 'ENOENT' ? 'no such file' : code ?? 'error'})`);
  }
}

/**
 * Reads a CSV file with a header line. Every record must have as many fields as the
 * header; blank lines are skipped. Problems are reported with the file and line.
 *
 * Files with a quote character anywhere go through csv-parse. Files without one are split
 * on line breaks and commas directly, which is what RFC 4180 makes of unquoted fields; this
 * path exists for speed (csv-parse alone took most of the time of weighting 200,000 rows).
 */
export function readCsv(file: string, requiredColumns: readonly string[] = []): CsvTable {
  const text = readText(file).replace(/^\uFEFF/, '');
  if (text.trim() === '') throw new CliInputError(`${file}: file is empty`);
  const table = text.includes('"') ? parseQuoted(file, text) : splitPlain(file, text);
  const seen = new Set<string>();
  for (const name of table.header) {
    if (seen.has(name)) throw new CliInputError(`${file}: line 1: column "${name}" appears twice`);
    seen.add(name);
  }
  for (const column of requiredColumns) {
    if (!seen.has(column)) throw new CliInputError(`${file}: line 1: missing column "${column}"`);
  }
  if (table.rowCount === 0) throw new CliInputError(`${file}: no rows after the header line`);
  return table;
}

function parseQuoted(file: string, text: string): CsvTable {
  let rows: { record: string[]; info: { lines: number } }[];
  try {
    rows = parse(text, { skip_empty_lines: true, info: true, relax_column_count: false }) as unknown as typeof rows;
  } catch (error) {
    throw new CliInputError(`${file}: ${(error as Error).message.replace(/\s+/g, ' ')}`);
  }
  const [head, ...body] = rows;
  const lines = Int32Array.from(body, (r) => r.info.lines);
  const row = (i: number) => (body[i] as { record: string[] }).record;
  return {
    file,
    header: (head?.record ?? []).map((h) => h.trim()),
    rowCount: body.length,
    line: (i) => lines[i] as number,
    row,
    pick: (i, columns, out) => columns.forEach((c, x) => (out[x] = row(i)[c] ?? '')),
    rawLines: null,
  };
}

function splitPlain(file: string, text: string): CsvTable {
  const all = text.split('\n');
  const lines: number[] = [];
  const raw: string[] = [];
  all.forEach((l, i) => {
    const line = l.endsWith('\r') ? l.slice(0, -1) : l;
    if (line !== '') {
      lines.push(i + 1);
      raw.push(line);
    }
  });
  const [headerLine = '', ...recordLines] = raw;
  const header = headerLine.split(',').map((h) => h.trim());
  const starts = new Int32Array(header.length + 1);
  // Field k of the current line spans starts[k] .. starts[k+1] − 1; checked for every line up front.
  const scan = (i: number): string => {
    const line = recordLines[i] as string;
    let count = 0;
    let at = -1;
    do {
      if (count < starts.length) starts[count] = at + 1;
      count++;
      at = line.indexOf(',', at + 1);
    } while (at !== -1);
    if (count !== header.length) throw new CliInputError(`${file}: line ${lines[i + 1]}: ${count} fields where the header has ${header.length}`);
    starts[count] = line.length + 1;
    return line;
  };
  for (let i = 0; i < recordLines.length; i++) scan(i);
  return {
    file,
    header,
    rowCount: recordLines.length,
    line: (i) => lines[i + 1] as number,
    row: (i) => (recordLines[i] as string).split(','),
    pick: (i, columns, out) => {
      const line = scan(i);
      columns.forEach((c, x) => (out[x] = line.slice(starts[c] as number, (starts[c + 1] as number) - 1)));
    },
    rawLines: { header: headerLine, records: recordLines },
  };
}

export function writeCsvAtomic(file: string, header: readonly string[], records: readonly (readonly unknown[])[]): void {
  writeTextAtomic(file, stringify([header, ...records]));
}

export function writeTextAtomic(file: string, text: string): void {
  const temporary = join(dirname(file), `.${basename(file)}.${randomBytes(6).toString('hex')}.tmp`);
  try {
    writeFileSync(temporary, text);
    renameSync(temporary, file);
  } catch (error) {
    rmSync(temporary, { force: true });
    throw new CliInputError(`${file}: cannot be written (${(error as NodeJS.ErrnoException).code ?? 'error'})`);
  }
}
