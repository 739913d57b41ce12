// The interviewers' effect on the headline (docs/methods.md, "Interviewer checks"): the
// intra-interviewer correlation of the yes/no headline answer (yes 1, no 0; don't know and no
// answer left out, as in the share) minus the mean of its weighting cell (the combination of
// categories the balance weights it in), the interviewer design effect it implies, and the
// design effect from all sources: Kish's weighting design effect times the interviewer's. Read
// from interviewer_counts (per interviewer and combination of categories), never from interviews.
import { allSourcesDesignEffect, deviationsFromCellMeans, interviewerCorrelation } from '../estimation/interviewer-correlation.js';

/** Counted completes of one interviewer in one weighting cell. */
export interface InterviewerCellCount {
  interviewer: string;
  /** The weighting cell (the same key for the same combination of categories as weighted). */
  cell: string;
  yes: number;
  /** Answered yes or no. */
  answered: number;
}

export interface InterviewerEffect {
  /** ρ̂, negative estimates set to 0. */
  rho: number;
  /** ρ̂ before negative values are set to 0. */
  rawRho: number;
  m0: number;
  mStar: number;
  interviewers: number;
  /** Completes that answered yes or no, the correlation's data. */
  interviews: number;
  /** 1 + ρ̂·(m* − 1). */
  designEffect: number;
  /** Kish's weighting design effect × the interviewer design effect; null until weights are computed. */
  allSourcesDesignEffect: number | null;
  /** The balance's interviews over the all-sources design effect; null until weights are computed. */
  allSourcesEffectiveSampleSize: number | null;
}

/** Each answered complete as a row: yes 1, no 0. */
export function answerRows(counts: InterviewerCellCount[]): { interviewer: string; cell: string; value: number }[] {
  return counts.flatMap((c) => [
    ...Array.from({ length: c.yes }, () => ({ interviewer: c.interviewer, cell: c.cell, value: 1 })),
    ...Array.from({ length: c.answered - c.yes }, () => ({ interviewer: c.interviewer, cell: c.cell, value: 0 })),
  ]);
}

/** Null with fewer than two interviewers or no interviewer with more than one answer. */
export function interviewerEffect(counts: InterviewerCellCount[], weightingDesignEffect: number | null, n: number): InterviewerEffect | null {
  const groups = deviationsFromCellMeans(answerRows(counts));
  const icc = interviewerCorrelation([...groups.values()]);
  if (!icc) return null;
  const all = weightingDesignEffect === null ? null : allSourcesDesignEffect(weightingDesignEffect, icc.designEffect, n);
  return {
    rho: icc.rho,
    rawRho: icc.rawRho,
    m0: icc.m0,
    mStar: icc.mStar,
    interviewers: icc.interviewers,
    interviews: icc.interviews,
    designEffect: icc.designEffect,
    allSourcesDesignEffect: all?.designEffect ?? null,
    allSourcesEffectiveSampleSize: all?.effectiveSampleSize ?? null,
  };
}
