// GET /api/projects/:id/benchmarks (lead, admin): the other polls recorded on the headline
// question. Server data: query cache only.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { BenchmarkListResponse, BenchmarkPollResponse } from '../../../lib/api-types';

export type BenchmarkPoll = BenchmarkPollResponse;

export const benchmarkKeys = {
  all: ['benchmarks'] as const,
  polls: (projectId: string) => [...benchmarkKeys.all, projectId, 'polls'] as const,
  reconciliation: (projectId: string) => [...benchmarkKeys.all, projectId, 'reconciliation'] as const,
};

export function getBenchmarks(projectId: string, signal?: AbortSignal): Promise<BenchmarkListResponse> {
  return apiRequest<BenchmarkListResponse>(`/projects/${projectId}/benchmarks`, { signal });
}

export function benchmarksQueryOptions(projectId: string) {
  return queryOptions({ queryKey: benchmarkKeys.polls(projectId), queryFn: ({ signal }) => getBenchmarks(projectId, signal) });
}

export function useBenchmarks(projectId: string) {
  return useQuery(benchmarksQueryOptions(projectId));
}
