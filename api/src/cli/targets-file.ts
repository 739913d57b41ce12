import type { MarginTarget } from '../estimation/raking.js';
import { readCsv } from './csv-files.js';
import { CliInputError } from './errors.js';
import { parseNumber } from './values.js';

export interface TargetsFile {
  file: string;
  targets: MarginTarget[];
  /** Line of each variable's category row, for messages: lineOf(variable, category). */
  lineOf(variable: string, category: string): number;
}

/**
 * Reads a targets CSV with columns variable,category,share. Shares may be any non-negative
 * numbers (counts are fine); they are normalised per variable later.
 */
export function readTargets(file: string): TargetsFile {
  const table = readCsv(file, ['variable', 'category', 'share']);
  const col = (name: string) => table.header.indexOf(name);
  const [iv, ic, is] = [col('variable'), col('category'), col('share')];
  const byVariable = new Map<string, { category: string; share: number }[]>();
  const lines = new Map<string, number>();
  for (let i = 0; i < table.rowCount; i++) {
    const record = table.row(i);
    const line = table.line(i);
    const variable = (record[iv] ?? '').trim();
    const category = (record[ic] ?? '').trim();
    const text = record[is] ?? '';
    if (variable === '') throw new CliInputError(`${file}: line ${line}: variable is empty`);
    const share = parseNumber(text);
    if (share === null || share < 0) {
      throw new CliInputError(`${file}: line ${line}: variable ${variable} category "${category}": share "${text}" is not a non-negative number`);
    }
    const key = JSON.stringify([variable, category]);
    if (lines.has(key)) {
      throw new CliInputError(`${file}: line ${line}: variable ${variable} category "${category}" is given twice (first on line ${lines.get(key)})`);
    }
    lines.set(key, line);
    const list = byVariable.get(variable) ?? [];
    list.push({ category, share });
    byVariable.set(variable, list);
  }
  for (const [variable, shares] of byVariable) {
    if (shares.every((s) => s.share === 0)) {
      throw new CliInputError(`${file}: line ${lines.get(JSON.stringify([variable, shares[0]?.category]))}: variable ${variable}: all shares are zero`);
    }
  }
  return {
    file,
    targets: [...byVariable].map(([variable, shares]) => ({ variable, shares })),
    lineOf: (variable, category) => lines.get(JSON.stringify([variable, category])) ?? 0,
  };
}
