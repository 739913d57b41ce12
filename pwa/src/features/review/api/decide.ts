// POST /api/projects/:id/review/decisions: approve, reject or reinstate interviews with a
// reason. A decision changes what is counted, so the queue, its trails and what the board,
// the cells and the balance show are fetched again (their keys' first parts are named here
// rather than imported, as features do not import each other).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { DecisionResultResponse, ReviewDecisionDto } from '../../../lib/api-types';
import { reviewKeys } from './get-review-queue';

export type Decision = ReviewDecisionDto;
export type DecisionResult = DecisionResultResponse;

/** Server data a decision changes, besides the queue: the quota board, the cells, the balance, the flag counts. */
const CHANGED_BY_A_DECISION = ['quota-board', 'cells', 'balance', 'flagged-interviews'];

export function decide(projectId: string, decision: Decision): Promise<DecisionResult> {
  return apiRequest<DecisionResult>(`/projects/${projectId}/review/decisions`, { method: 'POST', body: decision });
}

export function useDecide(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (decision: Decision) => decide(projectId, decision),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: reviewKeys.project(projectId) }),
        ...CHANGED_BY_A_DECISION.map((root) => queryClient.invalidateQueries({ queryKey: [root, projectId] })),
      ]),
  });
}
