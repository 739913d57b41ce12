// GET /api/users (admin and lead): the organisation's accounts. Server data: query cache only.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../api-client';
import type { Role } from '../../config/roles';

export interface OrganisationUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  /** invited: has not set a password yet; disabled: may not sign in. */
  status: 'invited' | 'active' | 'disabled';
  createdAt: string;
}

export const userKeys = {
  all: ['users'] as const,
  list: () => [...userKeys.all, 'list'] as const,
};

export function getUsers(signal?: AbortSignal): Promise<OrganisationUser[]> {
  return apiRequest<OrganisationUser[]>('/users', { signal });
}

export function usersQueryOptions() {
  return queryOptions({ queryKey: userKeys.list(), queryFn: ({ signal }) => getUsers(signal) });
}

export function useUsers() {
  return useQuery(usersQueryOptions());
}
