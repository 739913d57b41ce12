// GET /api/projects/:id/cells: quota variables and cell counts. The sync engine copies the
// answer to the device (db/cache-store) so cell status is known offline.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../lib/api-client';
import type { CellsResponse } from '../../lib/api-types';

export type ProjectCells = CellsResponse;

export const projectCellKeys = {
  all: ['projects'] as const,
  cells: (projectId: string) => [...projectCellKeys.all, projectId, 'cells'] as const,
};

export function getProjectCells(projectId: string, signal?: AbortSignal): Promise<ProjectCells> {
  return apiRequest<ProjectCells>(`/projects/${encodeURIComponent(projectId)}/cells`, { signal });
}

export function projectCellsQueryOptions(projectId: string) {
  return queryOptions({
    queryKey: projectCellKeys.cells(projectId),
    queryFn: ({ signal }) => getProjectCells(projectId, signal),
  });
}

export function useProjectCells(projectId: string) {
  return useQuery(projectCellsQueryOptions(projectId));
}
