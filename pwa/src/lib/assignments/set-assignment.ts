// PUT /api/projects/:id/assignments/:userId sets an interviewer's assignment; DELETE clears it.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import type { SetAssignmentDto } from '../api-types';
import { assignmentKeys, type Assignment } from './get-assignments';

export function setAssignment(projectId: string, userId: string, body: SetAssignmentDto): Promise<Assignment> {
  return apiRequest<Assignment>(`/projects/${projectId}/assignments/${userId}`, { method: 'PUT', body });
}

export function clearAssignment(projectId: string, userId: string): Promise<void> {
  return apiRequest<void>(`/projects/${projectId}/assignments/${userId}`, { method: 'DELETE' });
}

type Change = { userId: string; assignment: SetAssignmentDto | null };

/** Sets (or, with `assignment: null`, clears) one interviewer's assignment. */
export function useChangeAssignment(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, assignment }: Change) =>
      assignment ? setAssignment(projectId, userId, assignment).then(() => undefined) : clearAssignment(projectId, userId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: assignmentKeys.project(projectId) }),
  });
}
