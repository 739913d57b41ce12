export type CellStatus = 'open' | 'nearly_full' | 'full' | 'closed';

/**
 * A cell's status as interviewers and supervisors see it. "Nearly full" starts when at most
 * a tenth of the target (at least one interview) remains: a common field rule of thumb, not
 * a published standard.
 */
export function cellStatus(target: number, achieved: number, closed: boolean): CellStatus {
  if (closed) return 'closed';
  const remaining = target - achieved;
  if (remaining <= 0) return 'full';
  if (remaining <= Math.max(1, Math.ceil(target * 0.1))) return 'nearly_full';
  return 'open';
}
