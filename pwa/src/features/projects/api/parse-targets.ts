// POST /api/projects/:id/targets/parse (lead, admin): reads an uploaded targets CSV and
// returns it for review. Nothing is saved, so nothing in the cache changes.
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { ParsedTargetsResponse } from '../../../lib/api-types';

export function parseTargets(projectId: string, file: File): Promise<ParsedTargetsResponse> {
  const form = new FormData();
  form.append('file', file);
  return apiRequest<ParsedTargetsResponse>(`/projects/${projectId}/targets/parse`, { method: 'POST', body: form });
}

export function useParseTargets(projectId: string) {
  return useMutation({ mutationFn: (file: File) => parseTargets(projectId, file) });
}
