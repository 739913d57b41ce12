// GET /api/projects/:id/interviews/flags (supervisor, lead, admin): interviews the server kept
// but flagged on arrival (sent after the project closed, outside the field dates …), counted
// by reason. Server data: query cache only; it refreshes with the quota board.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { boardRefreshMs } from './get-quota-board';

export interface FlaggedInterviews {
  /** Interviews with at least one flag; one interview may carry several. */
  total: number;
  byReason: { code: string; reason: string; count: number }[];
}

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
