// POST /api/projects (lead, admin): a new project, in set-up. The project list is refetched.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { projectKeys, type Project } from '../../../lib/projects/get-projects';

export interface NewProject {
  name: string;
  topic?: string;
  /** Calendar days, YYYY-MM-DD. */
  fieldStart: string;
  fieldEnd: string;
  targetSize: number;
  headlineQuestion: string;
  /** IANA time zone in which field days are counted. */
  timeZone: string;
}

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
