// GET /api/projects/:id/balance (lead, admin, supervisor, client): the live balance of the
// completed interviews. Server data: query cache only; refreshed every minute while open.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export interface BalanceMargin {
  variable: string;
  category: string;
  /** Proportions (0–1), as everywhere in the code; the screen shows percentages. */
  target: number;
  unweighted: number;
  weighted: number | null;
}

export interface BalanceOutcome {
  column: string;
  unweighted: number;
  weighted?: number;
  /** Standard error of the weighted share, linearised through the raking. */
  standardError?: number | null;
  /** Korn–Graubard 95% interval of the weighted share. */
  interval?: [number, number] | null;
  method?: string;
  /** 1.96 standard errors; shown only when the interval is near symmetric. */
  marginOfError?: number | null;
  impliedBiasFactor?: number | null;
  impliedBiasFactorInterval?: [number, number] | null;
}

export interface Balance {
  projectId: string;
  headlineQuestion: string;
  n: number;
  excluded: number;
  converged: boolean | null;
  iterations: number | null;
  designEffect: number | null;
  effectiveSampleSize: number | null;
  weightMin: number | null;
  weightMax: number | null;
  maxMarginError: number | null;
  margins: BalanceMargin[];
  outcome: BalanceOutcome | null;
  /** Why weights cannot be computed yet, in a sentence for the reader; null when they were. */
  weightingProblem: string | null;
  /** Figures not given because they cannot be trusted, each with the reason (absent from older servers). */
  withheld?: { figure: string; reason: string }[];
  computedAt: string;
}

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
