// POST /api/projects/:id/interviews/sync: one batch of up to 1,000 contacts. Called only by
// the sync engine (never from a screen), so it has no hook; the key names it for devtools.
import { apiRequest } from '../../lib/api-client';
import type { SyncReplyResponse } from '../../lib/api-types';

export const SYNC_BATCH_LIMIT = 1000;

/** Per item, in the order sent: accepted (perhaps over quota or flagged), duplicate or rejected with a reason. */
export type SyncReply = SyncReplyResponse;
export type SyncItemResult = SyncReply['results'][number];

export const interviewSyncKeys = {
  batch: (projectId: string) => ['projects', projectId, 'interviews', 'sync'] as const,
};

export function postInterviewBatch(projectId: string, interviews: unknown[]): Promise<SyncReply> {
  return apiRequest<SyncReply>(`/projects/${encodeURIComponent(projectId)}/interviews/sync`, {
    method: 'POST',
    body: { interviews },
  });
}
