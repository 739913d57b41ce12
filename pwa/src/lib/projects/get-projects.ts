// GET /api/projects: the projects this user may see. Server data: lives in the query cache.
// Shared (lib) because the project picker of several features reads the same list.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import type { ProjectResponse } from '../api-types';

export type Project = ProjectResponse;

export const projectKeys = {
  all: ['projects'] as const,
  list: () => [...projectKeys.all, 'list'] as const,
  detail: (id: string) => [...projectKeys.all, 'detail', id] as const,
};

export function getProjects(signal?: AbortSignal): Promise<Project[]> {
  return apiRequest<Project[]>('/projects', { signal });
}

export function projectsQueryOptions() {
  return queryOptions({ queryKey: projectKeys.list(), queryFn: ({ signal }) => getProjects(signal) });
}

export function useProjects() {
  return useQuery(projectsQueryOptions());
}
