// Offline copies of server data an interviewer needs in the field (tables `projectCache`,
// `cellCache`) and the time of each interviewer's last successful sync (table `meta`).
// Written only by the sync module; read by the screens, online or not.
import { useLiveQuery } from 'dexie-react-hooks';
import { db, type CachedCells, type FieldProject, type QuotaCell, type QuotaVariable } from './plumbline-db';

const lastSyncKey = (userId: string) => `lastSync:${userId}`;

/** Replaces the interviewer's cached project list with the server's. */
export async function saveProjects(userId: string, projects: FieldProject[]): Promise<void> {
  const savedAt = new Date().toISOString();
  await db.transaction('rw', db.projectCache, async () => {
    await db.projectCache.where('userId').equals(userId).delete();
    await db.projectCache.bulkPut(
      projects.map((project, position) => ({ userId, projectId: project.id, position, project, savedAt })),
    );
  });
}

export async function readProjects(userId: string): Promise<FieldProject[]> {
  const rows = await db.projectCache.where('userId').equals(userId).sortBy('position');
  return rows.map((row) => row.project);
}

/** `undefined` while reading. */
export function useCachedProjects(userId: string | undefined): FieldProject[] | undefined {
  return useLiveQuery(async () => (userId ? readProjects(userId) : undefined), [userId]);
}

export async function saveCells(projectId: string, cells: QuotaCell[], syncedAt: string, variables?: QuotaVariable[]): Promise<void> {
  await db.transaction('rw', db.cellCache, async () => {
    const known = await db.cellCache.get(projectId);
    await db.cellCache.put({ projectId, cells, syncedAt, variables: variables ?? known?.variables ?? [] });
  });
}

export async function readCells(projectId: string): Promise<CachedCells | undefined> {
  return db.cellCache.get(projectId);
}

/** `undefined` while reading; projects never synced on this device are missing from the record. */
export function useCachedCells(projectIds: string[]): Record<string, CachedCells> | undefined {
  const key = projectIds.join(',');
  const result = useLiveQuery(async () => {
    const rows = await db.cellCache.bulkGet(key ? key.split(',') : []);
    return { key, cells: Object.fromEntries(rows.filter((row) => row !== undefined).map((row) => [row.projectId, row])) };
  }, [key]);
  // While the projects change, the previous answer would belong to other projects: report "reading".
  return result?.key === key ? result.cells : undefined;
}

export async function setLastSync(userId: string, at: string): Promise<void> {
  await db.meta.put({ key: lastSyncKey(userId), value: at });
}

/** `undefined` while reading; `null` when this interviewer never synced on this device. */
export function useLastSync(userId: string | undefined): string | null | undefined {
  return useLiveQuery(async () => {
    if (!userId) return undefined;
    const row = await db.meta.get(lastSyncKey(userId));
    return typeof row?.value === 'string' ? row.value : null;
  }, [userId]);
}
