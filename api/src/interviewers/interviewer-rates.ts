// Pure assembly of the interviewers' figures from grouped counts: outcome mix, AAPOR groups and
// the cooperation, refusal and contact rates, with e estimated once for the whole project and
// passed to every interviewer's and day's call (docs/methods.md, section 10). No response rates:
// for a quota sample there is no sampled case to count from.
import { DISPOSITIONS, type Disposition } from '../database/tables.js';
import { outcomeRates, type DispositionCounts } from '../estimation/outcome-rates.js';
import { aaporCounts } from './aapor-groups.js';
import type { ContactGroup } from './rates.repository.js';

/** The rates shown: COOP1 (completes over contacted eligible cases), REF2 and CON2 (both with e). */
export const SHOWN_RATES = ['COOP1', 'REF2', 'CON2'] as const;
export type ShownRate = (typeof SHOWN_RATES)[number];

export type OutcomeMix = Record<Disposition, number>;

export interface ContactFigures {
  contacts: number;
  completes: number;
  outcomes: OutcomeMix;
  /** The same contacts in the AAPOR groups (non-contacts and 'other' of unknown eligibility as UH and UO). */
  groups: DispositionCounts;
  /** Null when the project's e cannot be estimated or a rate's denominator is zero. */
  rates: Record<ShownRate, number | null>;
}

const emptyMix = (): OutcomeMix => Object.fromEntries(DISPOSITIONS.map((d) => [d, 0])) as OutcomeMix;

/**
 * e, the eligible share of unknown-eligibility cases, from the whole project's resolved cases;
 * null when the project has none yet.
 */
export function projectE(groups: ContactGroup[]): number | null {
  const counts = aaporCounts(groups);
  const resolved = counts.I + counts.P + counts.R + counts.NC + counts.O + counts.NE;
  return resolved > 0 ? outcomeRates(counts).e : null;
}

/** The figures of a set of contact groups (one interviewer, or one interviewer's day) under the project's e. */
export function contactFigures(groups: ContactGroup[], e: number | null): ContactFigures {
  const outcomes = emptyMix();
  for (const g of groups) outcomes[g.disposition] += g.count;
  const counts = aaporCounts(groups);
  const contacts = groups.reduce((s, g) => s + g.count, 0);
  const none = { COOP1: null, REF2: null, CON2: null };
  const all = contacts > 0 && e !== null ? outcomeRates(counts, e) : null;
  return {
    contacts,
    completes: outcomes.complete,
    outcomes,
    groups: counts,
    rates: all ? { COOP1: all.COOP1, REF2: all.REF2, CON2: all.CON2 } : none,
  };
}
