// POST /api/projects/:id/cells/:cellId/close (supervisor, lead): interviewers' devices learn
// it at their next sync. The returned cell goes straight into the cached board.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { applyCellChange, quotaBoardKeys, type Cell } from './get-quota-board';

export function closeCell(projectId: string, cellId: string): Promise<Cell> {
  return apiRequest<Cell>(`/projects/${projectId}/cells/${cellId}/close`, { method: 'POST' });
}

export function useCloseCell(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (cellId: string) => closeCell(projectId, cellId),
    onSuccess: (cell) => {
      applyCellChange(queryClient, projectId, cell);
      return queryClient.invalidateQueries({ queryKey: quotaBoardKeys.project(projectId) });
    },
  });
}
