/**
 * Writes invented interview files for the fictional county of Vellmoor: a data CSV with
 * four quota variables and a 0/1 outcome, and the matching targets CSV. The sample mix is
 * deliberately off the targets so raking has work to do. Deterministic (seeded), no I/O
 * beyond the two files named on the command line.
 *
 *   npx tsx bench/generate-data.ts ROWS SEED DATA.csv TARGETS.csv
 */
import { randomUUID } from 'node:crypto';
import { writeFileSync } from 'node:fs';
import type { Disposition } from '../api/src/database/tables.js';
import { draw, drawRespondent, seeded, VELLMOOR_TARGETS } from '../api/src/demo/vellmoor.js';

export { VELLMOOR_TARGETS };

export function generateRows(rows: number, seed: number): string[][] {
  const random = seeded(seed);
  const variables = Object.keys(VELLMOOR_TARGETS);
  return Array.from({ length: rows }, (_, i) => {
    const r = drawRespondent(random);
    return [`V${String(i + 1).padStart(6, '0')}`, ...variables.map((v) => r.categories[v] as string), r.supports ? '1' : '0'];
  });
}

export function writeFiles(rows: number, seed: number, dataFile: string, targetsFile: string): void {
  const header = ['interview_id', ...Object.keys(VELLMOOR_TARGETS), 'supports_tram'];
  const body = generateRows(rows, seed).map((r) => r.map((v) => (v.includes(',') ? `"${v}"` : v)).join(','));
  writeFileSync(dataFile, `${[header.join(','), ...body].join('\n')}\n`);
  const targets = Object.entries(VELLMOOR_TARGETS).flatMap(([v, shares]) => Object.entries(shares).map(([c, s]) => `${v},${c},${s}`));
  writeFileSync(targetsFile, `${['variable,category,share', ...targets].join('\n')}\n`);
}

/** Contact outcomes of door-to-door fieldwork, in percent (invented, of a plausible size). */
export const CONTACT_MIX = { complete: 25, partial: 4, refusal: 28, non_contact: 38, other: 3, not_eligible: 2 };

export interface ContactPlan {
  projectId: string;
  interviewerIds: string[];
  /** Field days (YYYY-MM-DD) to spread the contacts over. */
  days: string[];
  /** Category ids per variable name and label, as the targets endpoint returns them. */
  categoryId: (variable: string, label: string) => string;
}

/** Rows for the interviews table: contacts of every outcome by many interviewers over many days. */
export function contactRows(count: number, random: () => number, plan: ContactPlan) {
  return Array.from({ length: count }, () => {
    const r = drawRespondent(random);
    const disposition = draw(random, CONTACT_MIX) as Disposition;
    const complete = disposition === 'complete';
    const day = plan.days[Math.floor(random() * plan.days.length)] as string;
    return {
      id: randomUUID(),
      project_id: plan.projectId,
      interviewer_id: plan.interviewerIds[Math.floor(random() * plan.interviewerIds.length)] as string,
      disposition,
      category_ids: complete ? Object.entries(r.categories).map(([v, label]) => plan.categoryId(v, label)) : [],
      headline_answer: complete ? ((r.supports ? 'yes' : 'no') as 'yes' | 'no') : null,
      started_at: new Date(`${day}T10:00:00Z`),
      ended_at: new Date(`${day}T10:15:00Z`),
      field_day: day,
    };
  });
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const [rows, seed, dataFile, targetsFile] = process.argv.slice(2);
  if (!rows || !seed || !dataFile || !targetsFile) {
    console.error('usage: npx tsx bench/generate-data.ts ROWS SEED DATA.csv TARGETS.csv');
    process.exit(2);
  }
  writeFiles(Number(rows), Number(seed), dataFile, targetsFile);
}
