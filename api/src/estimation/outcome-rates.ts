import { EstimationInputError } from './errors.js';

/** Final disposition counts in the AAPOR Standard Definitions' groups. */
export interface DispositionCounts {
  /** Complete interviews. */
  I: number;
  /** Partial interviews. */
  P: number;
  /** Refusals and break-offs. */
  R: number;
  /** Non-contacts. */
  NC: number;
  /** Other eligible non-interviews. */
  O: number;
  /** Unknown if household / occupied. */
  UH: number;
  /** Unknown eligibility, other. */
  UO: number;
  /** Not eligible. */
  NE: number;
}

export const DISPOSITION_CODES = ['I', 'P', 'R', 'NC', 'O', 'UH', 'UO', 'NE'] as const;
export type DispositionCode = (typeof DISPOSITION_CODES)[number];

export const RATE_NAMES = [
  'RR1', 'RR2', 'RR3', 'RR4', 'RR5', 'RR6', 'COOP1', 'COOP2', 'COOP3', 'COOP4',
  'REF1', 'REF2', 'REF3', 'CON1', 'CON2', 'CON3',
] as const;
export type RateName = (typeof RATE_NAMES)[number];

/** Each rate, or null when its denominator is zero. */
export type OutcomeRates = { e: number } & Record<RateName, number | null>;

/**
 * Outcome rates of the AAPOR Standard Definitions, 9th edition (2016; docs/methods.md, section 10), "Calculating rates
 * from response distributions". The formulas below are written from memory and agree with
 * the cooperation-rate formulas the association restates when correcting its rate
 * calculator (citing AAPOR 2016: 63):
 *   RR1 = I / ((I+P) + (R+NC+O) + (UH+UO))      RR2 = (I+P) / same
 *   RR3 = I / ((I+P) + (R+NC+O) + e(UH+UO))     RR4 = (I+P) / same
 *   RR5 = I / ((I+P) + (R+NC+O))                RR6 = (I+P) / same
 *   COOP1 = I / ((I+P) + R + O)   COOP2 = (I+P) / same
 *   COOP3 = I / ((I+P) + R)       COOP4 = (I+P) / same
 *   REF1 = R / ((I+P)+(R+NC+O)+(UH+UO))  REF2 = R / (…+e(UH+UO))  REF3 = R / ((I+P)+(R+NC+O))
 *   CON1 = ((I+P)+R+O) / ((I+P)+R+O+NC+(UH+UO))  CON2 = … / (…+e(UH+UO))  CON3 = … / ((I+P)+R+O+NC)
 * e, the eligible share of unknown-eligibility cases, defaults to the eligible share among
 * resolved cases, (I+P+R+NC+O) / (I+P+R+NC+O+NE) (the proportional allocation the
 * Standard Definitions describe as one defensible basis for e).
 */
export function outcomeRates(counts: Partial<DispositionCounts>, e?: number): OutcomeRates {
  const c = {} as DispositionCounts;
  for (const code of DISPOSITION_CODES) {
    const v = counts[code] ?? 0;
    if (!(Number.isFinite(v) && v >= 0)) throw new EstimationInputError(`count for ${code} must be a non-negative number`);
    c[code] = v;
  }
  const { I, P, R, NC, O, UH, UO, NE } = c;
  const interviews = I + P;
  const eligible = interviews + R + NC + O;
  const unknown = UH + UO;
  if (eligible + unknown + NE === 0) throw new EstimationInputError('all counts are zero');
  let share = e;
  if (share === undefined) {
    if (eligible + NE === 0) throw new EstimationInputError('e cannot be estimated: no resolved cases; give e explicitly');
    share = eligible / (eligible + NE);
  }
  if (!(share >= 0 && share <= 1)) throw new EstimationInputError('e must lie between 0 and 1');
  const ratio = (a: number, b: number): number | null => (b > 0 ? a / b : null);
  const contacted = interviews + R + O;
  return {
    e: share,
    RR1: ratio(I, eligible + unknown),
    RR2: ratio(interviews, eligible + unknown),
    RR3: ratio(I, eligible + share * unknown),
    RR4: ratio(interviews, eligible + share * unknown),
    RR5: ratio(I, eligible),
    RR6: ratio(interviews, eligible),
    COOP1: ratio(I, interviews + R + O),
    COOP2: ratio(interviews, interviews + R + O),
    COOP3: ratio(I, interviews + R),
    COOP4: ratio(interviews, interviews + R),
    REF1: ratio(R, eligible + unknown),
    REF2: ratio(R, eligible + share * unknown),
    REF3: ratio(R, eligible),
    CON1: ratio(contacted, contacted + NC + unknown),
    CON2: ratio(contacted, contacted + NC + share * unknown),
    CON3: ratio(contacted, contacted + NC),
  };
}
