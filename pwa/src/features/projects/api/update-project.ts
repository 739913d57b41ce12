// PATCH /api/projects/:id (lead, admin): facts or status. A new target size recomputes the
// cells on the server, so the project's cells are refetched too.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ProjectStatus, UpdateProjectDto } from '../../../lib/api-types';
import { projectKeys, type Project } from '../../../lib/projects/get-projects';
import { cellKeys } from './get-cells';

export type { ProjectStatus };
export type ProjectChanges = UpdateProjectDto;

export function updateProject(projectId: string, changes: ProjectChanges): Promise<Project> {
  return apiRequest<Project>(`/projects/${projectId}`, { method: 'PATCH', body: changes });
}

export function useUpdateProject(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: ProjectChanges) => updateProject(projectId, changes),
    onSuccess: (project) => {
      queryClient.setQueryData(projectKeys.detail(projectId), project);
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: projectKeys.all }),
        queryClient.invalidateQueries({ queryKey: cellKeys.project(projectId) }),
      ]);
    },
  });
}
