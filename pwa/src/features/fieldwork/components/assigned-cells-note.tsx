import type { FieldProject } from '../../../db/plumbline-db';
import type { LocalCell } from '../../../sync/cell-status';

/**
 * A gentle word when the respondent falls in none of the cells the interviewer was given.
 * It refuses nothing: the interview counts like any other.
 */
export function AssignedCellsNote({ project, theirCells }: { project: FieldProject; theirCells: LocalCell[] }) {
  const assigned = new Set(project.mine?.assignment?.cellIds ?? []);
  if (assigned.size === 0 || theirCells.length === 0 || theirCells.some((cell) => assigned.has(cell.id))) return null;
  return (
    <p className="pl-form-note" role="note">
      This respondent is outside the cells you were given. You can still interview them; it counts like any other interview.
    </p>
  );
}
