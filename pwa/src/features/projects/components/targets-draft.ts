// The quota targets as the lead edits them: text as typed, checked before saving.
import type { Targets } from '../api/get-targets';

export interface DraftCategory {
  key: number;
  /** The saved category this is; absent for a new one. A rename keeps it, so interviews keep counting. */
  id?: string;
  label: string;
  share: string;
}

export interface DraftVariable {
  key: number;
  /** The saved variable this is; absent for a new one. */
  id?: string;
  /** Display name: what screens show. */
  name: string;
  /** Column name in targets files and exports; made from the name until the lead types one. */
  columnName: string;
  columnEdited: boolean;
  interlocked: boolean;
  categories: DraftCategory[];
}

let nextKey = 1;
export const newKey = () => nextKey++;

export function blankVariable(): DraftVariable {
  return { key: newKey(), name: '', columnName: '', columnEdited: false, interlocked: false, categories: [blankCategory(), blankCategory()] };
}

export function blankCategory(): DraftCategory {
  return { key: newKey(), label: '', share: '' };
}

/** Shares in hundredths stay readable: 0.11 → "11". */
function asTyped(share: number, scale: number): string {
  return String(Number((share * scale).toFixed(4)));
}

/**
 * Shares are always shown as percentages of their variable, whether they came from the server
 * (proportions), or from a file in proportions, percentages or census counts: one scale on
 * screen, whatever the source.
 */
export function draftFrom(targets: Targets): DraftVariable[] {
  return targets.variables.map((v) => {
    const total = v.categories.reduce((sum, c) => sum + c.share, 0);
    return {
      key: newKey(),
      ...(v.id ? { id: v.id } : {}),
      name: v.name,
      columnName: v.columnName ?? toColumnName(v.name),
      columnEdited: v.id !== undefined,
      interlocked: Boolean(v.interlocked),
      categories: v.categories.map((c) => ({ key: newKey(), ...(c.id ? { id: c.id } : {}), label: c.label, share: asTyped(total > 0 ? c.share / total : 0, 100) })),
    };
  });
}

/** The column name the server makes from a display name: "Age band" → age_band (as the API's toColumnName). */
export function toColumnName(name: string): string {
  const snake = name.toLowerCase().normalize('NFKD').replace(/[\u0300-\u036f]/g, '').replace(/[^a-z0-9]+/g, '_').replace(/^_+|_+$/g, '');
  if (snake === '') return '';
  return (/^[a-z]/.test(snake) ? snake : `v_${snake}`).slice(0, 60);
}

/** A variable renamed: its column name follows the name until the lead types one or it is saved. */
export function renamed(variable: DraftVariable, name: string): DraftVariable {
  return { ...variable, name, columnName: variable.columnEdited ? variable.columnName : toColumnName(name) };
}

/**
 * Variables whose typed shares are on no plain scale, with their totals: not percentages
 * (100, half a point either way), not proportions (1, within 0.005) and not plainly counts
 * (whole numbers adding up to 1,000 or more, as census tables give them). Those on a plain
 * scale are saved normalised without asking; the rest ask first.
 */
export function offTotals(variables: DraftVariable[]): { name: string; total: number }[] {
  return variables
    .map((v) => ({ v, name: v.name.trim() || 'unnamed', total: shareTotal(v) }))
    .filter(({ v, total }) => total > 0 && !onPlainScale(v, total))
    .map(({ name, total }) => ({ name, total }));
}

function onPlainScale(variable: DraftVariable, total: number): boolean {
  if (Math.abs(total - 100) <= 0.5 || Math.abs(total - 1) <= 0.005) return true;
  return total >= 1000 && variable.categories.every((c) => Number.isInteger(parseShare(c.share)));
}

/** A typed share: "30", "0.3", "30%" and the decimal comma "0,3". */
export function parseShare(text: string): number | null {
  const typed = text.trim();
  const percent = typed.endsWith('%');
  const number = (percent ? typed.slice(0, -1).trim() : typed).replace(',', '.');
  const value = Number(number);
  return number === '' || !Number.isFinite(value) ? null : value;
}

export function shareTotal(variable: DraftVariable): number {
  return variable.categories.reduce((sum, c) => sum + (parseShare(c.share) ?? 0), 0);
}

/** The targets to send, or the first problems in words (nothing is sent while any remain). */
export function checkDraftTargets(variables: DraftVariable[]): { targets?: Targets; problems: string[] } {
  const problems: string[] = [];
  if (variables.length === 0) problems.push('Add at least one quota variable.');
  const names = new Set<string>();
  variables.forEach((v, i) => {
    const name = v.name.trim() || `variable ${i + 1}`;
    if (!v.name.trim()) problems.push(`Variable ${i + 1} needs a name.`);
    else if (names.has(name.toLowerCase())) problems.push(`${name} is given twice.`);
    names.add(name.toLowerCase());
    const column = v.columnName.trim();
    if (column && !/^[a-z][a-z0-9_]*$/.test(column)) {
      problems.push(`${name}: the column in files must be lower-case letters, digits and underscores, starting with a letter (such as age_band).`);
    }
    if (v.categories.length === 0) problems.push(`${name}: add at least one category.`);
    const labels = new Set<string>();
    v.categories.forEach((c, j) => {
      const label = c.label.trim();
      if (!label) problems.push(`${name}: category ${j + 1} needs a name.`);
      else if (labels.has(label.toLowerCase())) problems.push(`${name}: category “${label}” is given twice.`);
      labels.add(label.toLowerCase());
      const share = parseShare(c.share);
      if (share === null) problems.push(`${name}: the share of “${label || `category ${j + 1}`}” must be a number.`);
      else if (share < 0) problems.push(`${name}: the share of “${label}” must not be negative.`);
    });
    if (v.categories.length > 0 && shareTotal(v) === 0) problems.push(`${name}: the shares are all zero.`);
  });
  if (variables.filter((v) => v.interlocked).length === 1) problems.push('Interlock at least two variables, or none.');
  if (problems.length > 0) return { problems };
  return {
    problems,
    targets: {
      variables: variables.map((v) => ({
        ...(v.id ? { id: v.id } : {}),
        name: v.name.trim(),
        ...(v.columnName.trim() ? { columnName: v.columnName.trim() } : {}),
        interlocked: v.interlocked,
        categories: v.categories.map((c) => ({ ...(c.id ? { id: c.id } : {}), label: c.label.trim(), share: parseShare(c.share) ?? 0 })),
      })),
    },
  };
}
