// POST /api/projects/:id/duplicate (lead, admin): a new project in set-up with this one's
// details, quota targets and team, and no interviews. The project list is refetched.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectKeys, type Project } from '../../../lib/projects/get-projects';

export function duplicateProject(projectId: string): Promise<Project> {
  return apiRequest<Project>(`/projects/${projectId}/duplicate`, { method: 'POST' });
}

export function useDuplicateProject(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => duplicateProject(projectId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.all }),
  });
}
