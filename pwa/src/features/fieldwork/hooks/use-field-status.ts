// Everything the interviewer's screens show, read from the device (Dexie) so it is the
// same online and offline: cached projects, cached cells with this device's unsent
// completes added, the outbox and the time of the last successful sync.
import { useMemo } from 'react';
import { useCachedCells, useCachedProjects, useLastSync } from '../../../db/cache-store';
import { useOwnEntries } from '../../../db/outbox-store';
import { useStoredSession } from '../../../db/session-store';
import type { FieldProject, OutboxEntry, QuotaVariable } from '../../../db/plumbline-db';
import { waitingCompletes, withUnsent, type LocalCell } from '../../../sync/cell-status';

export interface ProjectCellStatus {
  variables: QuotaVariable[];
  cells: LocalCell[];
  syncedAt: string;
}

export interface FieldStatus {
  userId: string;
  projects: FieldProject[];
  /** By project id; missing when this device never synced the project's cells. */
  cells: Record<string, ProjectCellStatus>;
  entries: OutboxEntry[];
  lastSync: string | null;
}

/** `undefined` while the device storage is being read. */
export function useFieldStatus(): FieldStatus | undefined {
  const session = useStoredSession();
  const userId = session?.user.id;
  const projects = useCachedProjects(userId);
  const entries = useOwnEntries(userId);
  const cached = useCachedCells(projects?.map((p) => p.id) ?? []);
  const lastSync = useLastSync(userId);

  return useMemo(() => {
    if (!userId || !projects || !entries || !cached || lastSync === undefined) return undefined;
    const cells: Record<string, ProjectCellStatus> = {};
    for (const [projectId, row] of Object.entries(cached)) {
      const unsent = waitingCompletes(entries.filter((entry) => entry.projectId === projectId));
      cells[projectId] = { variables: row.variables, cells: withUnsent(row.cells, unsent), syncedAt: row.syncedAt };
    }
    return { userId, projects, cells, entries, lastSync };
  }, [userId, projects, entries, cached, lastSync]);
}
