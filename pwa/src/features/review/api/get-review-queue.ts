// GET /api/projects/:id/review (supervisor, lead): interviews to review, flagged first, a page
// at a time, with the filters in the query. Server data: query cache only; nothing offline.
import { infiniteQueryOptions, useInfiniteQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ReviewItemResponse, ReviewQueueResponse } from '../../../lib/api-types';

export type ReviewItem = ReviewItemResponse;
export type ReviewPage = ReviewQueueResponse;

export interface ReviewFilters {
  flag?: string;
  interviewerId?: string;
  fieldDay?: string;
  cellId?: string;
  status?: 'pending' | 'approved' | 'rejected';
}

export const reviewKeys = {
  all: ['review'] as const,
  project: (projectId: string) => [...reviewKeys.all, projectId] as const,
  queue: (projectId: string, filters: ReviewFilters) => [...reviewKeys.project(projectId), 'queue', filters] as const,
};

export function getReviewPage(projectId: string, filters: ReviewFilters, after: string | null, signal?: AbortSignal): Promise<ReviewPage> {
  const query = new URLSearchParams(Object.entries(filters).filter((entry): entry is [string, string] => Boolean(entry[1])));
  if (after) query.set('after', after);
  const text = query.toString();
  return apiRequest<ReviewPage>(`/projects/${projectId}/review${text ? `?${text}` : ''}`, { signal });
}

export function useReviewQueue(projectId: string, filters: ReviewFilters) {
  return useInfiniteQuery(
    infiniteQueryOptions({
      queryKey: reviewKeys.queue(projectId, filters),
      queryFn: ({ pageParam, signal }) => getReviewPage(projectId, filters, pageParam, signal),
      initialPageParam: null as string | null,
      getNextPageParam: (last) => last.nextCursor,
    }),
  );
}
