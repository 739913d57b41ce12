// PUT /api/projects/:id/members (lead, admin): replaces the list of people on the project.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { memberKeys, type Member } from './get-members';

export function setMembers(projectId: string, userIds: string[]): Promise<Member[]> {
  return apiRequest<Member[]>(`/projects/${projectId}/members`, { method: 'PUT', body: { userIds } });
}

export function useSetMembers(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userIds: string[]) => setMembers(projectId, userIds),
    onSuccess: (members) => {
      queryClient.setQueryData(memberKeys.project(projectId), members);
      return queryClient.invalidateQueries({ queryKey: memberKeys.project(projectId) });
    },
  });
}
