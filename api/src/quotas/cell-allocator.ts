// Turns a project's quota variables, shares and sample size into stored cells with
// whole-number targets (largest remainder, via the estimation core). Cells are matched
// by their categories, so recomputing keeps each cell's id and its closed state.
import { Inject, Injectable, Module } from '@nestjs/common';
import type { Knex } from 'knex';
import { KNEX } from '../database/database.constants.js';
import type { QuotaCategoryRow, QuotaVariableRow } from '../database/tables.js';
import { JOINT_SEPARATOR } from '../estimation/joint-names.js';
import { allocateQuotas } from '../estimation/quotas.js';
import type { MarginTarget } from '../estimation/raking.js';

export interface ActiveTargets {
  variables: (QuotaVariableRow & { categories: QuotaCategoryRow[] })[];
}

export async function loadActiveTargets(db: Knex, projectId: string): Promise<ActiveTargets> {
  const variables = await db('quota_variables').where({ project_id: projectId, retired: false }).orderBy('position');
  const categories = await db('quota_categories').where({ project_id: projectId, retired: false }).orderBy('position');
  return {
    variables: variables.map((v) => ({ ...v, categories: categories.filter((c) => c.variable_id === v.id) })),
  };
}

/** Every variable and category the project ever had, retired ones included (sync reads devices' old ids with them). */
export async function loadAllTargets(db: Knex, projectId: string): Promise<ActiveTargets> {
  const variables = await db('quota_variables').where({ project_id: projectId }).orderBy([{ column: 'retired' }, { column: 'position' }]);
  const categories = await db('quota_categories').where({ project_id: projectId }).orderBy([{ column: 'retired' }, { column: 'position' }]);
  return {
    variables: variables.map((v) => ({ ...v, categories: categories.filter((c) => c.variable_id === v.id) })),
  };
}

/**
 * The project's joint table of its interlocked variables as a raking target ("age band × sex",
 * categories "18-24 × female"), or null when the cells use the product of the margins.
 */
export async function loadJointTable(db: Knex, projectId: string, variables: ActiveTargets['variables']): Promise<MarginTarget | null> {
  const rows = await db('quota_joint_shares').where({ project_id: projectId }).select('category_ids', 'share');
  const interlocked = variables.filter((v) => v.interlocked);
  if (rows.length === 0 || interlocked.length < 2) return null;
  const labels = new Map(interlocked.flatMap((v) => v.categories.map((c) => [c.id, c.label] as const)));
  const shares = rows.map((r) => ({ labels: r.category_ids.map((id) => labels.get(id)), share: r.share }));
  // Rows naming a category no longer active belong to targets since replaced: ignore the table.
  if (shares.some((s) => s.labels.length !== interlocked.length || s.labels.some((l) => l === undefined))) return null;
  return {
    variable: interlocked.map((v) => v.name).join(JOINT_SEPARATOR),
    parts: interlocked.map((v) => v.name),
    shares: shares.map((s) => ({ category: s.labels.join(JOINT_SEPARATOR), share: s.share })),
  };
}

/** The active variables and categories as the API shows them (targets and cells alike). */
export interface VariableView {
  id: string;
  /** Display name: what screens show. */
  name: string;
  /** Column name in targets files, exports and the command line. */
  columnName: string;
  interlocked: boolean;
  categories: { id: string; label: string; share: number }[];
}

export async function loadVariableViews(db: Knex, projectId: string): Promise<VariableView[]> {
  return variableViews((await loadActiveTargets(db, projectId)).variables);
}

/** The API's view of variables already loaded (loadActiveTargets). */
export function variableViews(variables: ActiveTargets['variables']): VariableView[] {
  return variables.map((v) => ({
    id: v.id,
    name: v.name,
    columnName: v.column_name,
    interlocked: v.interlocked,
    categories: v.categories.map((c) => ({ id: c.id, label: c.label, share: c.share })),
  }));
}

@Injectable()
export class CellAllocator {
  constructor(@Inject(KNEX) private readonly db: Knex) {}

  async recompute(projectId: string, trx: Knex.Transaction): Promise<void> {
    const project = await trx('projects').where({ id: projectId }).first();
    const { variables } = await loadActiveTargets(trx, projectId);
    if (!project || variables.length === 0) {
      await trx('quota_cells').where({ project_id: projectId }).delete();
      return;
    }
    const joint = await loadJointTable(trx, projectId, variables);
    const margins = variables.map((v) => ({ variable: v.name, shares: v.categories.map((c) => ({ category: c.label, share: c.share })) }));
    const allocation = allocateQuotas(joint ? [...margins, joint] : margins, project.target_size, {
      interlock: variables.filter((v) => v.interlocked).map((v) => v.name),
    });
    const categoryId = new Map<string, string>();
    for (const v of variables) for (const c of v.categories) categoryId.set(JSON.stringify([v.name, c.label]), c.id);

    const cells = allocation.sets.flatMap((set) =>
      set.cells.map((cell) => {
        const names = set.variables;
        return {
          project_id: projectId,
          kind: variables.some((v) => v.interlocked && v.name === names[0]) ? 'interlocked' : 'margin',
          category_ids: names.map((name) => categoryId.get(JSON.stringify([name, cell.categories[name]])) as string),
          label: names.map((name) => `${name}: ${cell.categories[name]}`).join(' × '),
          target: cell.target,
        } as const;
      }),
    );
    const keep = cells.map((c) => `{${c.category_ids.join(',')}}`);
    await trx('quota_cells')
      .where({ project_id: projectId })
      .whereRaw('NOT (category_ids::text = ANY(?::text[]))', [keep])
      .delete();
    await trx('quota_cells')
      .insert(cells.map((c, position) => ({ ...c, position })))
      .onConflict(['project_id', 'category_ids'])
      .merge(['kind', 'label', 'target', 'position']);
    await trx('projects').where({ id: projectId }).update({ targets_updated_at: trx.fn.now() });
  }
}

@Module({ providers: [CellAllocator], exports: [CellAllocator] })
export class CellAllocatorModule {}
