import { EstimationInputError } from './errors.js';

/**
 * The project's own weighted figure as a poll for the reconciliation: a weighted share w with
 * linearised standard error SE carries the information of n* = w(1−w)/SE² simple random
 * interviews (Kish's effective sample size of the estimate; the same n* the Korn–Graubard
 * interval uses, docs/methods.md section 3), so it enters as k = w·n* of n*, not as its raw count,
 * which would overstate its precision. The engine takes whole counts: both are rounded.
 */
export function effectivePoll(weighted: number, standardError: number): { successes: number; trials: number } {
  if (!(weighted >= 0 && weighted <= 1)) throw new EstimationInputError('the weighted share must lie between 0 and 1');
  if (!(standardError > 0 && Number.isFinite(standardError))) throw new EstimationInputError('the standard error must be a positive number');
  const trials = Math.max(1, Math.round((weighted * (1 - weighted)) / (standardError * standardError)));
  return { successes: Math.min(trials, Math.round(weighted * trials)), trials };
}
