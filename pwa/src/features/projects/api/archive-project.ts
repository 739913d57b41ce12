// POST /api/projects/:id/archive and /restore (lead, admin): a closed project leaves the
// everyday lists and interviewers' devices, read-only; restoring brings it back, closed.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectKeys, type Project } from '../../../lib/projects/get-projects';

export function archiveProject(projectId: string, action: 'archive' | 'restore'): Promise<Project> {
  return apiRequest<Project>(`/projects/${projectId}/${action}`, { method: 'POST' });
}

export function useArchiveProject(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (action: 'archive' | 'restore') => archiveProject(projectId, action),
    onSuccess: (project) => {
      queryClient.setQueryData(projectKeys.detail(projectId), project);
      return queryClient.invalidateQueries({ queryKey: projectKeys.all });
    },
  });
}
