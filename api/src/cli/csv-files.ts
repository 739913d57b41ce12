import { randomBytes } from 'node:crypto';
import { readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, basename } from 'node:path';
import { parse } from 'csv-parse/sync';
import { stringify } from 'csv-stringify/sync';
import { CliInputError } from './errors.js';

export interface CsvTable {
  file: string;
  header: string[];
  records: string[][];
  /** Line in the file where record i (0-based, after the header) ends. */
  line(i: number): number;
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
 */
export function readCsv(file: string, requiredColumns: readonly string[] = []): CsvTable {
  const text = readText(file);
  if (text.trim() === '') throw new CliInputError(`${file}: file is empty`);
  let rows: { record: string[]; info: { lines: number } }[];
  try {
    rows = parse(text, { bom: true, skip_empty_lines: true, info: true, relax_column_count: false }) as unknown as typeof rows;
  } catch (error) {
    throw new CliInputError(`${file}: ${(error as Error).message.replace(/\s+/g, ' ')}`);
  }
  const [head, ...body] = rows;
  if (!head) throw new CliInputError(`${file}: file is empty`);
  const header = head.record.map((h) => h.trim());
  const seen = new Set<string>();
  for (const name of header) {
    if (seen.has(name)) throw new CliInputError(`${file}: line ${head.info.lines}: column "${name}" appears twice`);
    seen.add(name);
  }
  for (const column of requiredColumns) {
    if (!seen.has(column)) throw new CliInputError(`${file}: line ${head.info.lines}: missing column "${column}"`);
  }
  if (body.length === 0) throw new CliInputError(`${file}: no rows after the header line`);
  const lines = Int32Array.from(body, (r) => r.info.lines);
  return { file, header, records: body.map((r) => r.record), line: (i) => lines[i] as number };
}

/** Writes the CSV to a temporary file beside the target, then renames it: a failure leaves nothing half-written. */
export function writeCsvAtomic(file: string, header: readonly string[], records: readonly (readonly unknown[])[]): void {
  const temporary = join(dirname(file), `.${basename(file)}.${randomBytes(6).toString('hex')}.tmp`);
  try {
    writeFileSync(temporary, stringify([header, ...records]));
    renameSync(temporary, file);
  } catch (error) {
    rmSync(temporary, { force: true });
    throw new CliInputError(`${file}: cannot be written (${(error as NodeJS.ErrnoException).code ?? 'error'})`);
  }
}
