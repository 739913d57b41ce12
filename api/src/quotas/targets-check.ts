// Checks a set of targets as a whole before anything is saved: names and labels given once,
// a sensible interlock, a joint table that agrees with its margins. Every fault is a 400
// that names the field.
import { BadRequestException } from '@nestjs/common';
import { EstimationInputError } from '../estimation/errors.js';
import { JOINT_SEPARATOR } from '../estimation/joint-names.js';
import { resolveTargets } from '../estimation/joint-targets.js';
import type { MarginTarget } from '../estimation/raking.js';
import { COLUMN_NAME, type SaveTargetsDto } from './dto/targets.dto.js';

/** The most cells an interlocked cross may have: more cannot be filled by a field team. */
const MAX_CROSSED_CELLS = 2000;

export function invalid(message: string, field = 'variables'): BadRequestException {
  return new BadRequestException({ message, fields: [{ field, message }] });
}

/** A display name made into a file column name: lower case, other characters as one underscore ("Age band" → age_band). */
export function toColumnName(name: string): string {
  const snake = name.toLowerCase().normalize('NFKD').replace(/[\u0300-\u036f]/g, '').replace(/[^a-z0-9]+/g, '_').replace(/^_+|_+$/g, '');
  const column = /^[a-z]/.test(snake) ? snake : `v_${snake}`;
  return column === 'v_' ? 'variable' : column.slice(0, 60);
}

/** The variable's file column name: as given, or made from its display name. */
export function columnNameOf(v: { name: string; columnName?: string }): string {
  return v.columnName ?? toColumnName(v.name.trim());
}

export function checkTargets(dto: SaveTargetsDto): void {
  const names = new Set<string>();
  const columns = new Set<string>();
  const ids = new Set<string>();
  const once = (id: string | undefined, field: string) => {
    if (id === undefined) return;
    if (ids.has(id.toLowerCase())) throw invalid(`the id ${id} is given twice`, field);
    ids.add(id.toLowerCase());
  };
  dto.variables.forEach((v, i) => {
    const name = v.name.trim();
    if (names.has(name.toLowerCase())) throw invalid(`variable ${name} is given twice`, `variables.${i}.name`);
    names.add(name.toLowerCase());
    const column = columnNameOf(v);
    if (!COLUMN_NAME.test(column)) throw invalid(`variable ${name}: column name ${column} must start with a letter`, `variables.${i}.columnName`);
    if (columns.has(column)) throw invalid(`variable ${name}: the column name ${column} is already used by another variable`, `variables.${i}.columnName`);
    columns.add(column);
    once(v.id, `variables.${i}.id`);
    const labels = new Set<string>();
    v.categories.forEach((c, j) => {
      once(c.id, `variables.${i}.categories.${j}.id`);
      const label = c.label.trim();
      if (labels.has(label.toLowerCase())) {
        throw invalid(`variable ${name}: category "${label}" is given twice`, `variables.${i}.categories.${j}.label`);
      }
      labels.add(label.toLowerCase());
    });
    if (v.categories.every((c) => c.share === 0)) throw invalid(`variable ${name}: all shares are zero`, `variables.${i}.categories`);
  });
  const interlocked = dto.variables.filter((v) => v.interlocked);
  if (interlocked.length === 1) throw invalid('choose at least two variables to interlock, or none');
  const crossed = interlocked.reduce((n, v) => n * v.categories.length, 1);
  if (crossed > MAX_CROSSED_CELLS) {
    throw invalid(`interlocking ${interlocked.map((v) => v.name).join(' × ')} gives ${crossed} cells; at most ${MAX_CROSSED_CELLS} are allowed`);
  }
  jointMargins(dto);
}

/**
 * The interlocked variables' margins summed from the joint shares, after checking the table
 * (every combination once, labels of the interlocked variables, margins given alongside within
 * 0.5 points: joint-targets.ts); null when the targets have no joint shares.
 */
export function jointMargins(dto: SaveTargetsDto): Map<string, Map<string, number>> | null {
  if (!dto.jointShares || dto.jointShares.length === 0) return null;
  const interlocked = dto.variables.filter((v) => v.interlocked);
  if (interlocked.length < 2) throw invalid('joint shares need at least two interlocked variables; interlock them, or leave out the joint shares', 'jointShares');
  const names = interlocked.map((v) => v.name.trim());
  const labelsOf = interlocked.map((v) => new Set(v.categories.map((c) => c.label.trim())));
  dto.jointShares.forEach((row, i) => {
    if (row.categories.length !== interlocked.length) {
      throw invalid(`joint share ${i + 1}: name one category of each of ${names.join(', ')}`, `jointShares.${i}.categories`);
    }
    row.categories.forEach((label, v) => {
      if (!labelsOf[v]?.has(label.trim())) {
        throw invalid(`joint share ${i + 1}: "${label.trim()}" is not a category of ${names[v]}`, `jointShares.${i}.categories`);
      }
    });
  });
  for (const [v, labels] of labelsOf.entries()) {
    const clash = [...labels].find((l) => l.includes(JOINT_SEPARATOR.trim()));
    if (clash) throw invalid(`${names[v]}: category "${clash}" contains "${JOINT_SEPARATOR.trim()}", which joint shares use between categories; rename it`, 'jointShares');
  }
  const joint: MarginTarget = {
    variable: names.join(JOINT_SEPARATOR),
    shares: dto.jointShares.map((row) => ({ category: row.categories.map((c) => c.trim()).join(JOINT_SEPARATOR), share: row.share })),
  };
  const margins: MarginTarget[] = interlocked.map((v) => ({
    variable: v.name.trim(),
    shares: v.categories.map((c) => ({ category: c.label.trim(), share: c.share })),
  }));
  try {
    const resolved = resolveTargets([joint, ...margins]);
    return new Map(resolved.margins.map((m) => [m.variable, new Map(m.shares.map((s) => [s.category, s.share]))]));
  } catch (error) {
    if (error instanceof EstimationInputError) throw invalid(`joint shares: ${error.message}`, 'jointShares');
    throw error;
  }
}

