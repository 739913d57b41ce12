// GET /api/projects/:id/cells: the cell targets the server allocated from the quota targets.
// Shared (lib): the set-up page and the assignment forms both list the cells.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import type { CellResponse, CellsResponse } from '../api-types';

export type ProjectCell = CellResponse;
export type ProjectCells = CellsResponse;

export const cellKeys = {
  all: ['cells'] as const,
  project: (projectId: string) => [...cellKeys.all, projectId] as const,
};

export function getCells(projectId: string, signal?: AbortSignal): Promise<ProjectCells> {
  return apiRequest<ProjectCells>(`/projects/${projectId}/cells`, { signal });
}

export function cellsQueryOptions(projectId: string) {
  return queryOptions({ queryKey: cellKeys.project(projectId), queryFn: ({ signal }) => getCells(projectId, signal) });
}

export function useCells(projectId: string) {
  return useQuery(cellsQueryOptions(projectId));
}
