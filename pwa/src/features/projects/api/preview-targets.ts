// POST /api/projects/:id/targets/preview (lead, admin): the cells targets would give, with the
// interviews already logged counted in them. Nothing is saved, so nothing in the cache changes.
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { TargetsPreviewResponse } from '../../../lib/api-types';
import type { Targets } from './get-targets';

export function previewTargets(projectId: string, targets: Targets): Promise<TargetsPreviewResponse> {
  return apiRequest<TargetsPreviewResponse>(`/projects/${projectId}/targets/preview`, { method: 'POST', body: targets });
}

export function usePreviewTargets(projectId: string) {
  return useMutation({ mutationFn: (targets: Targets) => previewTargets(projectId, targets) });
}
