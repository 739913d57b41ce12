// GET /api/projects/:id/quota-board (supervisor, lead, admin): every cell with its counts and
// each interviewer's completes. Server data: query cache only. It refreshes itself every
// 30 seconds while the page is open and whenever the window regains focus.
import { queryOptions, useQuery, type QueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { InterviewerProgressResponse, QuotaBoardResponse } from '../../../lib/api-types';
import type { CellStatus, QuotaCell } from '../../../lib/cells';

export type { CellStatus };
export type Cell = QuotaCell;
export type InterviewerProgress = InterviewerProgressResponse;
export type QuotaBoard = QuotaBoardResponse;

export const boardRefreshMs = 30_000;

export const quotaBoardKeys = {
  all: ['quota-board'] as const,
  project: (projectId: string) => [...quotaBoardKeys.all, projectId] as const,
};

export function getQuotaBoard(projectId: string, signal?: AbortSignal): Promise<QuotaBoard> {
  return apiRequest<QuotaBoard>(`/projects/${projectId}/quota-board`, { signal });
}

export function quotaBoardQueryOptions(projectId: string) {
  return queryOptions({
    queryKey: quotaBoardKeys.project(projectId),
    queryFn: ({ signal }) => getQuotaBoard(projectId, signal),
    refetchInterval: boardRefreshMs,
    refetchOnWindowFocus: true,
    staleTime: 0,
  });
}

export function useQuotaBoard(projectId: string) {
  return useQuery(quotaBoardQueryOptions(projectId));
}

/** Puts a cell the server just changed into the cached board, so the change shows at once. */
export function applyCellChange(queryClient: QueryClient, projectId: string, cell: Cell): void {
  queryClient.setQueryData<QuotaBoard>(quotaBoardKeys.project(projectId), (board) =>
    board ? { ...board, cells: board.cells.map((c) => (c.id === cell.id ? cell : c)) } : board,
  );
}
