// GET and PUT /api/projects/:id/quality-settings: the project's quality rules (lead reads and
// changes them; supervisors read). Saving queues a new computation of the flags on the server.
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { QualitySettingsDto, QualitySettingsResponse } from '../../../lib/api-types';

export type QualitySettings = QualitySettingsDto;
export type QualitySettingsView = QualitySettingsResponse;

export const qualityKeys = {
  settings: (projectId: string) => ['projects', projectId, 'quality-settings'] as const,
};

export function qualitySettingsQueryOptions(projectId: string) {
  return queryOptions({
    queryKey: qualityKeys.settings(projectId),
    queryFn: ({ signal }) => apiRequest<QualitySettingsView>(`/projects/${projectId}/quality-settings`, { signal }),
  });
}

export function useQualitySettings(projectId: string) {
  return useQuery(qualitySettingsQueryOptions(projectId));
}

export function useSaveQualitySettings(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings: QualitySettings) => apiRequest<QualitySettingsView>(`/projects/${projectId}/quality-settings`, { method: 'PUT', body: settings }),
    onSuccess: (view) => queryClient.setQueryData(qualityKeys.settings(projectId), view),
  });
}
