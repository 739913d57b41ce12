// Invented Vellmoor fixtures for the interviewer's screens and the sync module.
import { db, type FieldProject, type OutboxEntry, type QuotaCell, type QuotaVariable } from '../db/plumbline-db';

export const tramProject: FieldProject = {
  id: 'p-tram',
  name: 'Vellmoor tram extension',
  topic: 'Support for the eastern tram extension',
  fieldStart: '2026-11-16',
  fieldEnd: '2026-12-06',
  targetSize: 100,
  status: 'fieldwork',
  headlineQuestion: 'Do you support extending the tram line?',
  timeZone: 'Europe/London',
  archivedAt: null,
};

export const tramVariables: QuotaVariable[] = [
  { id: 'v-age', name: 'Age band', columnName: 'age_band', interlocked: false, categories: [{ id: 'c-young', label: '18-34', share: 0.4 }, { id: 'c-old', label: '35+', share: 0.6 }] },
  { id: 'v-region', name: 'Region', columnName: 'region', interlocked: false, categories: [{ id: 'c-mardon', label: 'Mardon', share: 0.7 }, { id: 'c-quay', label: 'Old Quay', share: 0.3 }] },
];

export function cell(id: string, label: string, categoryIds: string[], target: number, achieved: number, closedAt: string | null = null): QuotaCell {
  return {
    id,
    kind: 'margin',
    label,
    categoryIds,
    target,
    achieved,
    overQuota: 0,
    remaining: Math.max(0, target - achieved),
    fillRate: achieved / target,
    status: closedAt ? 'closed' : achieved >= target ? 'full' : 'open',
    closedAt,
  };
}

/** age 18-34 has one place left; the rest are wide open. */
export const tramCells: QuotaCell[] = [
  cell('cell-young', 'age_band: 18-34', ['c-young'], 50, 49),
  cell('cell-old', 'age_band: 35+', ['c-old'], 50, 10),
  cell('cell-mardon', 'region: Mardon', ['c-mardon'], 50, 10),
  cell('cell-quay', 'region: Old Quay', ['c-quay'], 50, 10),
];

/** Puts what one earlier sync would have left on the device. */
export async function syncedBefore(userId: string, cells = tramCells) {
  await db.projectCache.put({ userId, projectId: tramProject.id, position: 0, project: tramProject, savedAt: '2026-11-20T08:00:00Z' });
  await db.cellCache.put({ projectId: tramProject.id, variables: tramVariables, cells, syncedAt: '2026-11-20T08:00:00Z' });
}

export function completeEntry(n: number, interviewerId: string, categories: Record<string, string>, extra: Partial<OutboxEntry> = {}): OutboxEntry {
  const id = `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
  const at = new Date(Date.UTC(2026, 10, 20, 9, 0, n)).toISOString();
  return {
    clientId: id,
    interviewerId,
    projectId: tramProject.id,
    createdAt: at,
    payload: { id, disposition: 'complete', categories, headlineAnswer: true, startedAt: at, endedAt: at },
    ...extra,
  };
}
