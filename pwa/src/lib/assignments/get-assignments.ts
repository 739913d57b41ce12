// GET /api/projects/:id/assignments (lead, supervisor, admin): each interviewer's target of
// completes and cells to work. Shared (lib) because the lead's team section and the
// supervisor's interviewers page both set them.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import type { AssignmentResponse } from '../api-types';

export type Assignment = AssignmentResponse;

export const assignmentKeys = {
  all: ['assignments'] as const,
  project: (projectId: string) => [...assignmentKeys.all, projectId] as const,
};

export function getAssignments(projectId: string, signal?: AbortSignal): Promise<Assignment[]> {
  return apiRequest<Assignment[]>(`/projects/${projectId}/assignments`, { signal });
}

export function assignmentsQueryOptions(projectId: string) {
  return queryOptions({ queryKey: assignmentKeys.project(projectId), queryFn: ({ signal }) => getAssignments(projectId, signal) });
}

export function useAssignments(projectId: string) {
  return useQuery(assignmentsQueryOptions(projectId));
}
