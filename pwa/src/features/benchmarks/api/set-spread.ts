// PUT /api/projects/:id/reconciliation/settings (lead, admin): the spread prior of an unknown
// method group's bias factor, kept per project. The answer is the new reconciliation.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { benchmarkKeys } from './get-benchmarks';
import type { Reconciliation } from './get-reconciliation';

export function setSpread(projectId: string, spread: number): Promise<Reconciliation> {
  return apiRequest<Reconciliation>(`/projects/${projectId}/reconciliation/settings`, { method: 'PUT', body: { spread } });
}

export function useSetSpread(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (spread: number) => setSpread(projectId, spread),
    onSuccess: (reconciliation) => queryClient.setQueryData(benchmarkKeys.reconciliation(projectId), reconciliation),
  });
}
