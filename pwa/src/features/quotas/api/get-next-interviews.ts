// GET /api/projects/:id/next-interviews (supervisor, lead, admin): the quota cells where the next
// interviews raise the effective sample size most, and the cells over target that cost precision.
// Server data: query cache only; refreshed every minute while the board is open.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { NextInterviewsResponse } from '../../../lib/api-types';

export type NextInterviews = NextInterviewsResponse;

export const nextInterviewsKeys = {
  all: ['next-interviews'] as const,
  project: (projectId: string, count: number) => [...nextInterviewsKeys.all, projectId, count] as const,
};

export function getNextInterviews(projectId: string, count: number, signal?: AbortSignal): Promise<NextInterviews> {
  return apiRequest<NextInterviews>(`/projects/${projectId}/next-interviews?count=${count}`, { signal });
}

export function nextInterviewsQueryOptions(projectId: string, count: number) {
  return queryOptions({
    queryKey: nextInterviewsKeys.project(projectId, count),
    queryFn: ({ signal }) => getNextInterviews(projectId, count, signal),
    refetchInterval: 60_000,
    refetchOnWindowFocus: true,
    staleTime: 0,
  });
}

export function useNextInterviews(projectId: string, count = 50) {
  return useQuery(nextInterviewsQueryOptions(projectId, count));
}
