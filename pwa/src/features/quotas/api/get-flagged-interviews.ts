// GET /api/projects/:id/interviews/flags (supervisor, lead, admin): interviews the server kept
// but flagged on arrival (sent after the project closed, outside the field dates …), counted
// by reason. Server data: query cache only; it refreshes with the quota board.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { FlaggedInterviewsResponse } from '../../../lib/api-types';
import { boardRefreshMs } from './get-quota-board';

/** Interviews with at least one flag (one interview may carry several), counted by reason. */
export type FlaggedInterviews = FlaggedInterviewsResponse;

export const flaggedInterviewsKeys = {
  all: ['flagged-interviews'] as const,
  project: (projectId: string) => [...flaggedInterviewsKeys.all, projectId] as const,
};

export function getFlaggedInterviews(projectId: string, signal?: AbortSignal): Promise<FlaggedInterviews> {
  return apiRequest<FlaggedInterviews>(`/projects/${projectId}/interviews/flags`, { signal });
}

export function useFlaggedInterviews(projectId: string) {
  return useQuery(
    queryOptions({
      queryKey: flaggedInterviewsKeys.project(projectId),
      queryFn: ({ signal }) => getFlaggedInterviews(projectId, signal),
      refetchInterval: boardRefreshMs,
      refetchOnWindowFocus: true,
      staleTime: 0,
    }),
  );
}
