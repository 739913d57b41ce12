// GET /api/projects as an interviewer: the projects they are assigned to. The sync engine
// copies the answer to the device (db/cache-store) so the Today page works offline.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../lib/api-client';
import type { FieldProject } from '../../db/plumbline-db';

export const assignedProjectKeys = {
  all: ['projects'] as const,
  list: () => [...assignedProjectKeys.all, 'list'] as const,
};

export function getAssignedProjects(signal?: AbortSignal): Promise<FieldProject[]> {
  return apiRequest<FieldProject[]>('/projects', { signal });
}

export function assignedProjectsQueryOptions() {
  return queryOptions({ queryKey: assignedProjectKeys.list(), queryFn: ({ signal }) => getAssignedProjects(signal) });
}

export function useAssignedProjects() {
  return useQuery(assignedProjectsQueryOptions());
}
