import type { FieldProblem } from '../common/validation.js';
import type { MarginTarget } from '../estimation/raking.js';
import type { SaveTargetsDto } from './dto/targets.dto.js';

const PATH = /^(variables|jointShares)\.(\d+)(?:\.categories\.(\d+))?/;

/**
 * A validation problem of targets read from a file, told as the file's line: the DTO's field
 * path (variables.2.categories.5.label) is found again in the file by variable and category.
 */
export function atLine(
  problem: FieldProblem,
  source: string,
  dto: SaveTargetsDto,
  table: MarginTarget | undefined,
  lineOf: (variable: string, category: string) => number,
): FieldProblem {
  const m = PATH.exec(problem.field);
  let where = '';
  if (m?.[1] === 'variables') {
    const variable = dto.variables[Number(m[2])];
    const category = variable?.categories[m[3] === undefined ? 0 : Number(m[3])];
    const line = variable && category ? lineOf(variable.name, category.label) : 0;
    if (variable) where = `${line ? `line ${line}: ` : ''}variable ${variable.name}: `;
  } else if (m?.[1] === 'jointShares' && table) {
    const row = table.shares[Number(m[2])];
    const line = row ? lineOf(table.variable, row.category) : 0;
    if (line) where = `line ${line}: `;
  }
  return { field: 'file', message: `${source}: ${where}${problem.message}` };
}
