// The cell-status rule, written once for the server (boards, sync replies) and the device
// (offline checks while logging). Plain ESM JavaScript with its types in index.d.ts, so the
// API's tsc/node, Vite and Vitest all import it as it is, with no build step of its own.

/** Share of the target that may remain for a cell to count as nearly full (common practice). */
export const NEARLY_FULL_SHARE = 0.1;

/**
 * A cell's status as interviewers and supervisors see it. Closed by a supervisor wins; full
 * when nothing remains; nearly full when at most a tenth of the target (at least one
 * interview) remains: a common field rule of thumb, not a published standard.
 */
export function cellStatus(target, achieved, closed) {
  if (closed) return 'closed';
  const remaining = target - achieved;
  if (remaining <= 0) return 'full';
  if (remaining <= Math.max(1, Math.ceil(target * NEARLY_FULL_SHARE))) return 'nearly_full';
  return 'open';
}
