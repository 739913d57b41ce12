// GET /api/projects/:id/interviewers/rates (supervisor, lead, admin): each interviewer's
// contacts, outcome mix, cooperation, refusal and contact rates, per field day too, with
// durations, flags and back-check results. Server data: query cache only.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { InterviewerDayResponse, InterviewerRatesResponse, ProjectInterviewerRatesResponse } from '../../../lib/api-types';

export type InterviewerRates = InterviewerRatesResponse;
export type InterviewerDay = InterviewerDayResponse;
export type ProjectRates = ProjectInterviewerRatesResponse;

export const interviewerRatesKeys = {
  all: ['interviewer-rates'] as const,
  project: (projectId: string) => [...interviewerRatesKeys.all, projectId] as const,
};

export function getInterviewerRates(projectId: string, signal?: AbortSignal): Promise<ProjectRates> {
  return apiRequest<ProjectRates>(`/projects/${projectId}/interviewers/rates`, { signal });
}

export function interviewerRatesQueryOptions(projectId: string) {
  return queryOptions({
    queryKey: interviewerRatesKeys.project(projectId),
    queryFn: ({ signal }) => getInterviewerRates(projectId, signal),
    refetchOnWindowFocus: true,
  });
}

export function useInterviewerRates(projectId: string) {
  return useQuery(interviewerRatesQueryOptions(projectId));
}
