// GET /api/projects/:id/targets: the quota variables, categories and population shares.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { JointShareDto, SaveTargetsDto, TargetsResponse } from '../../../lib/api-types';

/**
 * Quota targets as the editor holds them, PUT takes them and a read file returns them:
 * variables with category labels and population shares (any non-negative numbers; the
 * server normalises them per variable). The server's saved targets fit this shape too.
 */
export type Targets = SaveTargetsDto;
/** Targets as the server keeps them: with ids, normalised shares and where interlocked cells' targets come from. */
export type SavedTargets = TargetsResponse;
/** Joint population share of one combination of the interlocked variables' categories (in their order). */
export type JointShare = JointShareDto;

export const targetKeys = {
  all: ['targets'] as const,
  project: (projectId: string) => [...targetKeys.all, projectId] as const,
};

export function getTargets(projectId: string, signal?: AbortSignal): Promise<SavedTargets> {
  return apiRequest<SavedTargets>(`/projects/${projectId}/targets`, { signal });
}

export function targetsQueryOptions(projectId: string) {
  return queryOptions({ queryKey: targetKeys.project(projectId), queryFn: ({ signal }) => getTargets(projectId, signal) });
}

export function useTargets(projectId: string) {
  return useQuery(targetsQueryOptions(projectId));
}
