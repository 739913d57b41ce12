import { ScrollBox } from '../../../components/scroll-box';
import { formatCount } from '../../../lib/format';
import type { ProjectedCell } from '../api/get-projection';
import { formatChance, formatPace } from './projection-words';

/** Every quota cell's expected count at the field end; the cells at risk first, most at risk on top. */
export function ProjectionCells({ cells, level }: { cells: ProjectedCell[]; level: number }) {
  const ordered = [...cells].sort((a, b) => Number(b.atRisk) - Number(a.atRisk) || b.probabilityBelowTarget - a.probabilityBelowTarget);
  const atRisk = cells.filter((c) => c.atRisk).length;
  return (
    <>
      <p>
        {atRisk === 0
          ? 'No cell is at risk: each ends at or above its target with a chance of 80% or more.'
          : `${formatCount(atRisk)} of ${formatCount(cells.length)} cells at risk: each ends below its target with a chance over 20%.`}
      </p>
      <ScrollBox label="Cells at the field end, scrolls sideways">
        <table className="pl-table" aria-label="Cells at the field end">
          <thead>
            <tr>
              <th scope="col">Cell</th>
              <th scope="col">Now / target</th>
              <th scope="col">Per day</th>
              <th scope="col">At the end ({Math.round(level * 100)}% range)</th>
              <th scope="col">Chance of ending short</th>
            </tr>
          </thead>
          <tbody>
            {ordered.map((c) => (
              <tr key={c.id}>
                <th scope="row">
                  {c.label}
                  {c.closed ? ' (closed)' : ''}
                </th>
                <td className="pl-figure">
                  {formatCount(c.achieved)} / {formatCount(c.target)}
                </td>
                <td className="pl-figure">{formatPace(c.pacePerDay)}</td>
                <td className="pl-figure">
                  {formatCount(Math.round(c.expected))} ({formatCount(c.lower)}–{formatCount(c.upper)})
                </td>
                <td className={`pl-figure${c.atRisk ? ' pl-projection-risk' : ''}`}>
                  {formatChance(c.probabilityBelowTarget)}
                  {c.atRisk ? ' · at risk' : ''}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollBox>
    </>
  );
}
