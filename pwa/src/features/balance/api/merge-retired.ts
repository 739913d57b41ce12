// PUT /api/projects/:id/balance/retired/:categoryId (lead, admin): what weighting does with a
// retired category's interviews: counted as a current category of the same variable, or
// (null) left out. The answer is the balance as it now stands, put straight into the cache.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { balanceKeys, type Balance } from './get-balance';

export function mergeRetired(projectId: string, categoryId: string, mergedInto: string | null): Promise<Balance> {
  return apiRequest<Balance>(`/projects/${projectId}/balance/retired/${categoryId}`, { method: 'PUT', body: { mergedInto } });
}

export function useMergeRetired(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ categoryId, mergedInto }: { categoryId: string; mergedInto: string | null }) => mergeRetired(projectId, categoryId, mergedInto),
    onSuccess: (balance) => queryClient.setQueryData(balanceKeys.project(projectId), balance),
  });
}
