import type { MarginTarget } from '../estimation/raking.js';
import { parseTargetsCsv, TargetsFormatError } from '../formats/targets-csv.js';
import { readText } from './csv-files.js';
import { CliInputError } from './errors.js';

export interface TargetsFile {
  file: string;
  targets: MarginTarget[];
  /** Line of each variable's category row, for messages: lineOf(variable, category). */
  lineOf(variable: string, category: string): number;
}

/**
 * Reads a targets CSV with columns variable,category,share (comma or semicolon separated,
 * with or without BOM). Shares may be any non-negative numbers (counts are fine); they are
 * normalised per variable later. The format is shared with the API's targets upload.
 */
export function readTargets(file: string): TargetsFile {
  try {
    const parsed = parseTargetsCsv(readText(file), file);
    return { file, targets: parsed.targets, lineOf: parsed.lineOf };
  } catch (error) {
    if (error instanceof TargetsFormatError) throw new CliInputError(error.message);
    throw error;
  }
}
