// GET /api/projects/:id/targets: the quota variables, categories and population shares.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export interface TargetCategory {
  label: string;
  /** Population share: any non-negative numbers; the server normalises them per variable. */
  share: number;
}

export interface TargetVariable {
  name: string;
  interlocked?: boolean;
  categories: TargetCategory[];
}

/** Joint population share of one combination of the interlocked variables' categories (in their order). */
export interface JointShare {
  categories: string[];
  share: number;
}

export interface Targets {
  variables: TargetVariable[];
  /** Joint shares of the interlocked variables; absent or empty when cell targets are the product of the margins. */
  jointShares?: JointShare[];
  /** Where the interlocked cells' targets come from (set by the server); null when nothing is interlocked. */
  interlockBasis?: 'joint shares' | 'product of margins' | null;
}

export const targetKeys = {
  all: ['targets'] as const,
  project: (projectId: string) => [...targetKeys.all, projectId] as const,
};

export function getTargets(projectId: string, signal?: AbortSignal): Promise<Targets> {
  return apiRequest<Targets>(`/projects/${projectId}/targets`, { signal });
}

export function targetsQueryOptions(projectId: string) {
  return queryOptions({ queryKey: targetKeys.project(projectId), queryFn: ({ signal }) => getTargets(projectId, signal) });
}

export function useTargets(projectId: string) {
  return useQuery(targetsQueryOptions(projectId));
}
