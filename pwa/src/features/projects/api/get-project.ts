// GET /api/projects/:id: one project's facts. Server data: query cache only.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectKeys, type Project } from '../../../lib/projects/get-projects';

export function getProject(projectId: string, signal?: AbortSignal): Promise<Project> {
  return apiRequest<Project>(`/projects/${projectId}`, { signal });
}

export function projectQueryOptions(projectId: string) {
  return queryOptions({ queryKey: projectKeys.detail(projectId), queryFn: ({ signal }) => getProject(projectId, signal) });
}

export function useProject(projectId: string) {
  return useQuery(projectQueryOptions(projectId));
}
