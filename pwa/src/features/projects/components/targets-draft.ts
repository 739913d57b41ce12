// The quota targets as the lead edits them: text as typed, checked before saving.
import type { Targets } from '../api/get-targets';

export interface DraftCategory {
  key: number;
  label: string;
  share: string;
}

export interface DraftVariable {
  key: number;
  name: string;
  interlocked: boolean;
  categories: DraftCategory[];
}

let nextKey = 1;
export const newKey = () => nextKey++;

export function blankVariable(): DraftVariable {
  return { key: newKey(), name: '', interlocked: false, categories: [blankCategory(), blankCategory()] };
}

export function blankCategory(): DraftCategory {
  return { key: newKey(), label: '', share: '' };
}

/** Shares in hundredths stay readable: 0.11 → "11". */
function asTyped(share: number, scale: number): string {
  return String(Number((share * scale).toFixed(4)));
}

/**
 * Targets from the server (normalised proportions) are shown as percentages; targets
 * read from a file keep the numbers the file gave (scale 1).
 */
export function draftFrom(targets: Targets, scale: number): DraftVariable[] {
  return targets.variables.map((v) => ({
    key: newKey(),
    name: v.name,
    interlocked: Boolean(v.interlocked),
    categories: v.categories.map((c) => ({ key: newKey(), label: c.label, share: asTyped(c.share, scale) })),
  }));
}

export function parseShare(text: string): number | null {
  const value = Number(text.trim().replace(',', '.'));
  return text.trim() === '' || !Number.isFinite(value) ? null : value;
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
        name: v.name.trim(),
        interlocked: v.interlocked,
        categories: v.categories.map((c) => ({ label: c.label.trim(), share: parseShare(c.share) ?? 0 })),
      })),
    },
  };
}
