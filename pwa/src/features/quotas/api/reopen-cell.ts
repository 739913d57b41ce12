// POST /api/projects/:id/cells/:cellId/reopen (supervisor, lead): devices learn
// it at their next sync. The returned cell goes straight into the cached board.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { applyCellChange, quotaBoardKeys, type Cell } from './get-quota-board';

export function reopenCell(projectId: string, cellId: string): Promise<Cell> {
  return apiRequest<Cell>(`/projects/${projectId}/cells/${cellId}/reopen`, { method: 'POST' });
}

export function useReopenCell(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (cellId: string) => reopenCell(projectId, cellId),
    onSuccess: (cell) => {
      applyCellChange(queryClient, projectId, cell);
      return queryClient.invalidateQueries({ queryKey: quotaBoardKeys.project(projectId) });
    },
  });
}
