// GET /api/projects/:id/cells: the cell targets the server allocated from the quota targets.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { CellResponse, CellsResponse } from '../../../lib/api-types';

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
