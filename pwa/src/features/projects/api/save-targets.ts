// PUT /api/projects/:id/targets (lead, admin): replaces the quota targets as a whole and
// recomputes the cells; interviews already logged are kept. Targets and cells are refetched.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { cellKeys } from './get-cells';
import { targetKeys, type SavedTargets, type Targets } from './get-targets';

export function saveTargets(projectId: string, targets: Targets): Promise<SavedTargets> {
  return apiRequest<SavedTargets>(`/projects/${projectId}/targets`, { method: 'PUT', body: targets });
}

export function useSaveTargets(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (targets: Targets) => saveTargets(projectId, targets),
    onSuccess: (saved) => {
      queryClient.setQueryData(targetKeys.project(projectId), saved);
      return queryClient.invalidateQueries({ queryKey: cellKeys.project(projectId) });
    },
  });
}
