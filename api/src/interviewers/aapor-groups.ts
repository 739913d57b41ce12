// The one place that maps the product's contact outcomes to the groups of the AAPOR Standard
// Definitions (9th edition, 2016) that the outcome rates are computed from
// (api/src/estimation/outcome-rates.ts, docs/methods.md section 10).
import type { Disposition } from '../database/tables.js';
import type { DispositionCode, DispositionCounts } from '../estimation/outcome-rates.js';

/**
 * complete → I, partial → P, refusal → R, non-contact → NC when someone eligible is known to live
 * there, else UH; other → O when eligibility is known, else UO; not eligible → NE; turned away
 * because the respondent's cell is full ('quota_full') → NE: the Standard Definitions' "quota
 * filled" code is a not-eligible case (4.80 in their tables, as recalled from memory, not checked
 * against the text here).
 */
export function aaporGroup(disposition: Disposition, eligibilityKnown: boolean | null): DispositionCode {
  switch (disposition) {
    case 'complete':
      return 'I';
    case 'partial':
      return 'P';
    case 'refusal':
      return 'R';
    case 'non_contact':
      return eligibilityKnown === true ? 'NC' : 'UH';
    case 'other':
      return eligibilityKnown === true ? 'O' : 'UO';
    case 'not_eligible':
    case 'quota_full':
      return 'NE';
  }
}

/** Counts per disposition (and eligibility) added up into the AAPOR groups. */
export function aaporCounts(rows: { disposition: Disposition; eligibilityKnown: boolean | null; count: number }[]): DispositionCounts {
  const counts: DispositionCounts = { I: 0, P: 0, R: 0, NC: 0, O: 0, UH: 0, UO: 0, NE: 0 };
  for (const r of rows) counts[aaporGroup(r.disposition, r.eligibilityKnown)] += r.count;
  return counts;
}
