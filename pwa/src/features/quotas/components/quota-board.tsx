import './quota-board.css';
import { useState } from 'react';
import { QueryView } from '../../../components/query-view';
import { EmptyPanel } from '../../../components/state-panels';
import { useOnline } from '../../../hooks/use-online';
import { useWideScreen } from '../../../hooks/use-wide-screen';
import { formatClock, formatCount } from '../../../lib/format';
import { useCloseCell } from '../api/close-cell';
import { useQuotaBoard, type Cell, type QuotaBoard as Board } from '../api/get-quota-board';
import { useReopenCell } from '../api/reopen-cell';
import { BoardFilters } from './board-filters';
import { initialView, sortedBy, visibleCells, type BoardView } from './board-view';
import { CellList } from './cell-list';
import { CellTable } from './cell-table';
import { CloseCellDialog } from './close-cell-dialog';
import { FlaggedInterviewsSection } from './flagged-interviews';
import { InterviewerProgressTable } from './interviewer-progress';
import { NextInterviewsSection } from './next-interviews';

/** One project's board: cells (table on desktop, list on a phone) and interviewers' completes. */
export function QuotaBoard({ projectId }: { projectId: string }) {
  const board = useQuotaBoard(projectId);
  return (
    <QueryView
      query={board}
      what="the quota board"
      offlineNote="The quota board needs the network. It will load as soon as you are back online."
      isEmpty={(data) => data.cells.length === 0}
      empty={
        <EmptyPanel title="No cells yet">
          <p>The cells appear once the project lead has saved the quota targets.</p>
        </EmptyPanel>
      }
    >
      {(data) => <BoardContent board={data} projectId={projectId} refreshing={board.isFetching} checkedAt={board.dataUpdatedAt} />}
    </QueryView>
  );
}

// "Updated" is when this screen last heard from the server (a 304 included), not the
// server's clock in the body: on a 304 the browser hands back the stored body unchanged.
function BoardContent({ board, projectId, refreshing, checkedAt }: { board: Board; projectId: string; refreshing: boolean; checkedAt: number }) {
  const wide = useWideScreen();
  const online = useOnline();
  const [view, setView] = useState<BoardView>(initialView);
  const [asking, setAsking] = useState<Cell | null>(null);
  const close = useCloseCell(projectId);
  const reopen = useReopenCell(projectId);
  const change = asking?.status === 'closed' ? reopen : close;

  const checked = formatClock(new Date(checkedAt).toISOString());
  const cells = visibleCells(board.cells, view);
  const completes = board.interviewers.reduce((sum, person) => sum + person.completesTotal, 0);
  const ask = (cell: Cell) => {
    close.reset();
    reopen.reset();
    setAsking(cell);
  };
  const confirm = () => {
    if (!asking) return;
    change.mutate(asking.id, { onSuccess: () => setAsking(null) });
  };

  return (
    <>
      <div className="pl-board-head">
        <p className="pl-board-total">
          <span className="pl-figure">{formatCount(completes)}</span> of <span className="pl-figure">{formatCount(board.targetSize)}</span> completes
        </p>
        <p className="pl-small pl-muted" role="status">
          {online ? `Updated ${checked}` : `Offline: as of ${checked}`}
          {refreshing ? ' · refreshing…' : ''}
        </p>
      </div>
      <BoardFilters view={view} onChange={setView} shown={cells.length} total={board.cells.length} example={exampleCategory(board.cells)} />
      {cells.length === 0 ? (
        <EmptyPanel title="No cells match">
          <p>Change the status or the text to see more cells.</p>
        </EmptyPanel>
      ) : wide ? (
        <CellTable cells={cells} view={view} onSort={(column) => setView(sortedBy(view, column))} onToggle={ask} />
      ) : (
        <CellList cells={cells} onToggle={ask} />
      )}
      <NextInterviewsSection projectId={projectId} />
      <FlaggedInterviewsSection projectId={projectId} />
      <section className="pl-section" aria-labelledby="pl-interviewers-heading">
        <h2 id="pl-interviewers-heading" className="pl-section-title">
          Interviewers
        </h2>
        <InterviewerProgressTable interviewers={board.interviewers} />
      </section>
      {asking ? (
        <CloseCellDialog
          cell={asking}
          busy={change.isPending}
          problem={change.error ? change.error.message : null}
          onConfirm={confirm}
          onCancel={() => setAsking(null)}
        />
      ) : null}
    </>
  );
}

/** A category of this project for the search's example ("region: Tarnholm" → "Tarnholm"). */
function exampleCategory(cells: Cell[]): string | undefined {
  return cells.at(-1)?.label.split(' × ').at(-1)?.split(': ').at(-1);
}
