// GET /api/projects/:id/balance (lead, admin, supervisor, client): the live balance of the
// completed interviews. Server data: query cache only; refreshed every minute while open.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { BalanceMarginResponse, BalanceOutcomeResponse, BalanceResponse } from '../../../lib/api-types';

/** Shares are proportions (0–1), as everywhere in the code; the screen shows percentages. */
export type Balance = BalanceResponse;
export type BalanceMargin = BalanceMarginResponse;
export type BalanceOutcome = BalanceOutcomeResponse;

export const balanceKeys = {
  all: ['balance'] as const,
  project: (projectId: string) => [...balanceKeys.all, projectId] as const,
};

export function getBalance(projectId: string, signal?: AbortSignal): Promise<Balance> {
  return apiRequest<Balance>(`/projects/${projectId}/balance`, { signal });
}

export function balanceQueryOptions(projectId: string) {
  return queryOptions({
    queryKey: balanceKeys.project(projectId),
    queryFn: ({ signal }) => getBalance(projectId, signal),
    refetchInterval: 60_000,
    refetchOnWindowFocus: true,
    staleTime: 0,
  });
}

export function useBalance(projectId: string) {
  return useQuery(balanceQueryOptions(projectId));
}
