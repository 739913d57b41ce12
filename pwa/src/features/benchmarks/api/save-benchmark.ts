// POST / PUT / DELETE /api/projects/:id/benchmarks[/:pollId] (lead, admin): record, change or
// remove another poll. Each change refreshes the poll list and the reconciliation.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { BenchmarkPollDto } from '../../../lib/api-types';
import { benchmarkKeys, type BenchmarkPoll } from './get-benchmarks';

export type PollDraft = BenchmarkPollDto;

export function saveBenchmark(projectId: string, poll: PollDraft, id?: string): Promise<BenchmarkPoll> {
  return id
    ? apiRequest<BenchmarkPoll>(`/projects/${projectId}/benchmarks/${id}`, { method: 'PUT', body: poll })
    : apiRequest<BenchmarkPoll>(`/projects/${projectId}/benchmarks`, { method: 'POST', body: poll });
}

export function deleteBenchmark(projectId: string, id: string): Promise<void> {
  return apiRequest<void>(`/projects/${projectId}/benchmarks/${id}`, { method: 'DELETE' });
}

function useRefresh(projectId: string) {
  const queryClient = useQueryClient();
  return () => queryClient.invalidateQueries({ queryKey: [...benchmarkKeys.all, projectId] });
}

export function useSaveBenchmark(projectId: string) {
  const refresh = useRefresh(projectId);
  return useMutation({ mutationFn: ({ poll, id }: { poll: PollDraft; id?: string }) => saveBenchmark(projectId, poll, id), onSuccess: refresh });
}

export function useDeleteBenchmark(projectId: string) {
  const refresh = useRefresh(projectId);
  return useMutation({ mutationFn: (id: string) => deleteBenchmark(projectId, id), onSuccess: refresh });
}
