// PATCH /api/users/:id/role (admin): counts from the person's next request.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '../../../config/roles';
import { apiRequest } from '../../../lib/api-client';
import { userKeys, type OrganisationUser } from '../../../lib/users/get-users';

export function changeRole(id: string, role: Role): Promise<OrganisationUser> {
  return apiRequest<OrganisationUser>(`/users/${id}/role`, { method: 'PATCH', body: { role } });
}

export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: string; role: Role }) => changeRole(id, role),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
