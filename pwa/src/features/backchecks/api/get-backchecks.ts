// GET /api/projects/:id/backchecks (supervisor, lead, admin): the back-check work list, pending
// first, with the project's back-check settings. Server data: query cache only.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { BackcheckListResponse, BackcheckResponse } from '../../../lib/api-types';

export type BackcheckList = BackcheckListResponse;
export type Backcheck = BackcheckResponse;
export type BackcheckOutcome = NonNullable<Backcheck['outcome']>;

export const backcheckKeys = {
  all: ['backchecks'] as const,
  project: (projectId: string) => [...backcheckKeys.all, projectId] as const,
};

export function getBackchecks(projectId: string, signal?: AbortSignal): Promise<BackcheckList> {
  return apiRequest<BackcheckList>(`/projects/${projectId}/backchecks`, { signal });
}

export function useBackchecks(projectId: string) {
  return useQuery(
    queryOptions({
      queryKey: backcheckKeys.project(projectId),
      queryFn: ({ signal }) => getBackchecks(projectId, signal),
      refetchOnWindowFocus: true,
    }),
  );
}
