// POST /api/projects/:id/backchecks/:interviewId/outcome (supervisor, lead, admin): records who
// found what on the call-back. "Could not reach" may be replaced later; the others are final.
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { backcheckKeys, type Backcheck, type BackcheckOutcome } from './get-backchecks';

export interface OutcomeInput {
  interviewId: string;
  outcome: BackcheckOutcome;
  note?: string;
}

export function recordOutcome(projectId: string, { interviewId, ...body }: OutcomeInput): Promise<Backcheck> {
  return apiRequest<Backcheck>(`/projects/${projectId}/backchecks/${interviewId}/outcome`, { method: 'POST', body });
}

export function useRecordOutcome(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OutcomeInput) => recordOutcome(projectId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: backcheckKeys.project(projectId) }),
  });
}
