// GET /api/projects: the projects this user may see. Server data: lives in the query cache.
// Shared (lib) because the project picker of several features reads the same list.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import type { ProjectListItemResponse, ProjectResponse } from '../api-types';

export type Project = ProjectResponse;
/** A project as listed: for an interviewer, with their own progress (`mine`). */
export type ProjectListItem = ProjectListItemResponse;

export const projectKeys = {
  all: ['projects'] as const,
  list: () => [...projectKeys.all, 'list'] as const,
  archived: () => [...projectKeys.all, 'archived'] as const,
  detail: (id: string) => [...projectKeys.all, 'detail', id] as const,
};

/** Projects not archived: the everyday list. */
export function getProjects(signal?: AbortSignal): Promise<ProjectListItem[]> {
  return apiRequest<ProjectListItem[]>('/projects', { signal });
}

export function getArchivedProjects(signal?: AbortSignal): Promise<ProjectListItem[]> {
  return apiRequest<ProjectListItem[]>('/projects?archived=true', { signal });
}

export function projectsQueryOptions() {
  return queryOptions({ queryKey: projectKeys.list(), queryFn: ({ signal }) => getProjects(signal) });
}

export function useProjects() {
  return useQuery(projectsQueryOptions());
}

export function useArchivedProjects(enabled = true) {
  return useQuery({ queryKey: projectKeys.archived(), queryFn: ({ signal }) => getArchivedProjects(signal), enabled });
}
