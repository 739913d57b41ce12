// POST /api/projects (lead, admin): a new project, in set-up. The project list is refetched.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { CreateProjectDto } from '../../../lib/api-types';
import { projectKeys, type Project } from '../../../lib/projects/get-projects';

/** Field dates are calendar days (YYYY-MM-DD); field days are counted in the IANA time zone. */
export type NewProject = CreateProjectDto;

export function createProject(project: NewProject): Promise<Project> {
  return apiRequest<Project>('/projects', { method: 'POST', body: project });
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.all }),
  });
}
