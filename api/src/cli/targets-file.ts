import { EstimationInputError } from '../estimation/errors.js';
import { resolveTargets } from '../estimation/joint-targets.js';
import type { MarginTarget } from '../estimation/raking.js';
import { parseTargetsCsv, TargetsFormatError } from '../formats/targets-csv.js';
import { readText } from './csv-files.js';
import { CliInputError } from './errors.js';

export interface TargetsFile {
  file: string;
  /** As written: plain margins and any joint tables ("age_band × sex"). */
  targets: MarginTarget[];
  /** One margin per data column: plain ones as given, those of a joint table summed from it. */
  margins: MarginTarget[];
  /** Line of each variable's category row, for messages: lineOf(variable, category). */
  lineOf(variable: string, category: string): number;
}

/**
 * Reads a targets CSV with columns variable,category,share (comma or semicolon separated,
 * with or without BOM). Shares may be any non-negative numbers (counts are fine); they are
 * normalised per variable later. Rows whose variable is "a × b" give the joint shares of
 * interlocked variables (categories "x × y"). The format is shared with the API's targets upload.
 */
export function readTargets(file: string): TargetsFile {
  try {
    const parsed = parseTargetsCsv(readText(file), file);
    return { file, targets: parsed.targets, margins: resolveTargets(parsed.targets).margins, lineOf: parsed.lineOf };
  } catch (error) {
    if (error instanceof TargetsFormatError) throw new CliInputError(error.message);
    if (error instanceof EstimationInputError) throw new CliInputError(`${file}: ${error.message}`);
    throw error;
  }
}
