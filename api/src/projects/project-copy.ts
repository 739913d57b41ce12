// A copy of a project to start a new wave: its facts, quota targets (with joint shares) and
// team, in set-up, with none of its interviews. The cells are allocated afresh.
import type { Knex } from 'knex';
import type { ProjectRow } from '../database/tables.js';
import type { CellAllocator } from '../quotas/cell-allocator.js';

/** Longest project name the API takes; a copy's name is shortened to fit its suffix. */
const NAME_LIMIT = 200;
const SUFFIX = ' (copy)';

export async function copyProject(trx: Knex.Transaction, source: ProjectRow, cells: CellAllocator): Promise<ProjectRow> {
  const [copy] = await trx('projects')
    .insert({
      organisation_id: source.organisation_id,
      name: `${source.name.slice(0, NAME_LIMIT - SUFFIX.length)}${SUFFIX}`,
      topic: source.topic,
      field_start: source.field_start,
      field_end: source.field_end,
      target_size: source.target_size,
      headline_question: source.headline_question,
      time_zone: source.time_zone,
      status: 'setup',
    })
    .returning('*');
  const target = copy as ProjectRow;
  const categoryIds = new Map<string, string>();
  const variables = await trx('quota_variables').where({ project_id: source.id, retired: false }).orderBy('position');
  for (const v of variables) {
    const [variable] = await trx('quota_variables')
      .insert({ project_id: target.id, name: v.name, column_name: v.column_name, position: v.position, interlocked: v.interlocked, retired: false })
      .returning('id');
    const categories = await trx('quota_categories').where({ variable_id: v.id, retired: false }).orderBy('position');
    if (categories.length === 0) continue;
    const inserted = await trx('quota_categories')
      .insert(categories.map((c) => ({ variable_id: variable!.id, project_id: target.id, label: c.label, position: c.position, share: c.share, retired: false })))
      .returning(['id', 'label', 'position']);
    for (const c of categories) categoryIds.set(c.id, inserted.find((i) => i.position === c.position)!.id);
  }
  const joint = await trx('quota_joint_shares').where({ project_id: source.id });
  const jointCopies = joint
    .map((row) => ({ project_id: target.id, category_ids: row.category_ids.map((id) => categoryIds.get(id)), share: row.share }))
    .filter((row) => row.category_ids.every((id) => id !== undefined)) as { project_id: string; category_ids: string[]; share: number }[];
  if (jointCopies.length > 0) await trx('quota_joint_shares').insert(jointCopies);
  const members = await trx('project_members').where({ project_id: source.id }).select('user_id');
  if (members.length > 0) await trx('project_members').insert(members.map((m) => ({ project_id: target.id, user_id: m.user_id })));
  await cells.recompute(target.id, trx);
  return target;
}
