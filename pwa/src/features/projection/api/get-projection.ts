// GET /api/projects/:id/projection (lead, admin, supervisor, client): where fieldwork ends at
// the recent pace. Server data: query cache only; refreshed every five minutes while open.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ProjectedCellResponse, ProjectionResponse } from '../../../lib/api-types';

export type Projection = ProjectionResponse;
export type ProjectedCell = ProjectedCellResponse;

export const projectionKeys = {
  all: ['projection'] as const,
  project: (projectId: string) => [...projectionKeys.all, projectId] as const,
};

export function getProjection(projectId: string, signal?: AbortSignal): Promise<Projection> {
  return apiRequest<Projection>(`/projects/${projectId}/projection`, { signal });
}

export function useProjection(projectId: string) {
  return useQuery(
    queryOptions({
      queryKey: projectionKeys.project(projectId),
      queryFn: ({ signal }) => getProjection(projectId, signal),
      refetchInterval: 300_000,
      refetchOnWindowFocus: true,
      staleTime: 0,
    }),
  );
}
