// GET /api/projects/:id/reconciliation (lead, admin, supervisor, client): the reconciled
// estimate of the true share from the benchmark polls and the project's own weighted share.
// Server data: query cache only; refreshed every minute, as the project's figure moves.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ReconciliationResponse } from '../../../lib/api-types';
import { benchmarkKeys } from './get-benchmarks';

export type Reconciliation = ReconciliationResponse;

export function getReconciliation(projectId: string, signal?: AbortSignal): Promise<Reconciliation> {
  return apiRequest<Reconciliation>(`/projects/${projectId}/reconciliation`, { signal });
}

export function reconciliationQueryOptions(projectId: string) {
  return queryOptions({
    queryKey: benchmarkKeys.reconciliation(projectId),
    queryFn: ({ signal }) => getReconciliation(projectId, signal),
    refetchInterval: 60_000,
    staleTime: 0,
  });
}

export function useReconciliation(projectId: string) {
  return useQuery(reconciliationQueryOptions(projectId));
}
