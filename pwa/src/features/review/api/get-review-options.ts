// GET /api/projects/:id/review/options: what the queue's filters can choose from (flags,
// interviewers, field days, cells). Server data: query cache only.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ReviewOptionsResponse } from '../../../lib/api-types';
import { reviewKeys } from './get-review-queue';

export type ReviewOptions = ReviewOptionsResponse;

export function getReviewOptions(projectId: string, signal?: AbortSignal): Promise<ReviewOptions> {
  return apiRequest<ReviewOptions>(`/projects/${projectId}/review/options`, { signal });
}

export function useReviewOptions(projectId: string) {
  return useQuery(
    queryOptions({
      queryKey: [...reviewKeys.project(projectId), 'options'],
      queryFn: ({ signal }) => getReviewOptions(projectId, signal),
    }),
  );
}
