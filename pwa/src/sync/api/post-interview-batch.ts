// POST /api/projects/:id/interviews/sync: one batch of up to 1,000 contacts. Called only by
// the sync engine (never from a screen), so it has no hook; the key names it for devtools.
import { apiRequest } from '../../lib/api-client';
import type { QuotaCell } from '../../db/plumbline-db';

export const SYNC_BATCH_LIMIT = 1000;

export type SyncItemResult =
  | { id: string | null; status: 'accepted'; overQuota?: boolean }
  | { id: string | null; status: 'duplicate' }
  | { id: string | null; status: 'rejected'; reason?: string };

export interface SyncReply {
  results: SyncItemResult[];
  accepted: number;
  duplicates: number;
  rejected: number;
  cells: QuotaCell[];
}

export const interviewSyncKeys = {
  batch: (projectId: string) => ['projects', projectId, 'interviews', 'sync'] as const,
};

export function postInterviewBatch(projectId: string, interviews: unknown[]): Promise<SyncReply> {
  return apiRequest<SyncReply>(`/projects/${encodeURIComponent(projectId)}/interviews/sync`, {
    method: 'POST',
    body: { interviews },
  });
}
