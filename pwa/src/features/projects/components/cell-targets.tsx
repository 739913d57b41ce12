import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { formatCount } from '../../../lib/format';
import { useCells } from '../api/get-cells';
import { ScrollBox } from '../../../components/scroll-box';
import { heading, WORDS } from '../../../lib/glossary';

/** The cell targets the server allocated (whole numbers that add up to the sample size). */
export function CellTargets({ projectId }: { projectId: string }) {
  const cells = useCells(projectId);
  return (
    <QueryView
      query={cells}
      what="cells"
      offlineNote="The cells need the network."
      isEmpty={(data) => data.cells.length === 0}
      empty={
        <EmptyPanel title="No cells yet">
          <p>Save quota targets to see the cell targets.</p>
        </EmptyPanel>
      }
    >
      {(data) => (
        <ScrollBox label="Cell targets, scrolls sideways">
          <table className="pl-table" aria-label="Cell targets">
            <thead>
              <tr>
                <th scope="col">{heading(WORDS.cell.one)}</th>
                <th scope="col">Kind</th>
                <th scope="col" className="is-numeric">{heading(WORDS.target.one)}</th>
                <th scope="col" className="is-numeric">{heading(WORDS.achieved.one)}</th>
              </tr>
            </thead>
            <tbody>
              {data.cells.map((cell) => (
                <tr key={cell.id}>
                  <th scope="row">{cell.label}</th>
                  <td>{heading(cell.kind === 'interlocked' ? WORDS.interlocked.one : WORDS.margin.one)}</td>
                  <td className="is-numeric pl-figure">{formatCount(cell.target)}</td>
                  <td className="is-numeric pl-figure">{formatCount(cell.achieved)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollBox>
      )}
    </QueryView>
  );
}
