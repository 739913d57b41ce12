// POST /api/users/:id/disable | enable (admin): disabling ends the person's sign-ins at once.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { userKeys, type OrganisationUser } from '../../../lib/users/get-users';

export function setActive(id: string, active: boolean): Promise<OrganisationUser> {
  return apiRequest<OrganisationUser>(`/users/${id}/${active ? 'enable' : 'disable'}`, { method: 'POST' });
}

export function useSetActive() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, active }: { id: string; active: boolean }) => setActive(id, active),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
