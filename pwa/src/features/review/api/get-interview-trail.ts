// GET /api/projects/:id/interviews/:interviewId/decisions: one interview's review decisions,
// oldest first (the audit trail). Server data: query cache only.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { TrailEntryResponse } from '../../../lib/api-types';
import { reviewKeys } from './get-review-queue';

export type TrailEntry = TrailEntryResponse;

export function getInterviewTrail(projectId: string, interviewId: string, signal?: AbortSignal): Promise<TrailEntry[]> {
  return apiRequest<TrailEntry[]>(`/projects/${projectId}/interviews/${interviewId}/decisions`, { signal });
}

export function useInterviewTrail(projectId: string, interviewId: string) {
  return useQuery(
    queryOptions({
      queryKey: [...reviewKeys.project(projectId), 'trail', interviewId],
      queryFn: ({ signal }) => getInterviewTrail(projectId, interviewId, signal),
    }),
  );
}
