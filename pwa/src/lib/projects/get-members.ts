// GET /api/projects/:id/members: who is assigned to the project. Shared (lib): the lead's
// team section and the supervisor's interviewers page both read it.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import type { ProjectMemberResponse } from '../api-types';

export type Member = ProjectMemberResponse;

export const memberKeys = {
  all: ['members'] as const,
  project: (projectId: string) => [...memberKeys.all, projectId] as const,
};

export function getMembers(projectId: string, signal?: AbortSignal): Promise<Member[]> {
  return apiRequest<Member[]>(`/projects/${projectId}/members`, { signal });
}

export function membersQueryOptions(projectId: string) {
  return queryOptions({ queryKey: memberKeys.project(projectId), queryFn: ({ signal }) => getMembers(projectId, signal) });
}

export function useMembers(projectId: string) {
  return useQuery(membersQueryOptions(projectId));
}
