// POST /api/users/invitations (admin): an account without a password; the person gets an
// e-mail with a one-time link to choose one. Refreshes the people list.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '../../../config/roles';
import { apiRequest } from '../../../lib/api-client';
import { userKeys, type OrganisationUser } from '../../../lib/users/get-users';

export interface Invitee {
  email: string;
  name: string;
  role: Role;
}

export function invitePerson(invitee: Invitee): Promise<OrganisationUser> {
  return apiRequest<OrganisationUser>('/users/invitations', { method: 'POST', body: invitee });
}

export function useInvitePerson() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: invitePerson,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }),
  });
}
