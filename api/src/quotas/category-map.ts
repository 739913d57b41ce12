// What each category an interview was logged in counts as today. An active category counts
// as itself; a retired one counts as the current category of the same variable the lead
// merged it into, or as nothing (its interviews are kept but not weighted). A category of a
// retired variable counts as nothing either: that variable is no longer part of the targets.
// The balance and the export read interviews through this, so both say the same.
import type { Knex } from 'knex';

export interface CategoryMeaning {
  id: string;
  variableId: string;
  /** The variable's display name. */
  variable: string;
  /** The label the interview was logged with. */
  label: string;
  retired: boolean;
  /** The active category it counts as; null when it is not counted. */
  countsAs: string | null;
}

export async function loadCategoryMap(db: Knex, projectId: string): Promise<Map<string, CategoryMeaning>> {
  const variables = await db('quota_variables').where({ project_id: projectId }).select('id', 'name', 'retired');
  const categories = await db('quota_categories').where({ project_id: projectId }).select('id', 'variable_id', 'label', 'retired', 'merged_into');
  const variableOf = new Map(variables.map((v) => [v.id, v]));
  const byId = new Map(categories.map((c) => [c.id, c]));
  const map = new Map<string, CategoryMeaning>();
  for (const c of categories) {
    const variable = variableOf.get(c.variable_id)!;
    const target = c.merged_into ? byId.get(c.merged_into) : undefined;
    const merged = target && !target.retired && target.variable_id === c.variable_id ? target.id : null;
    const countsAs = variable.retired ? null : c.retired ? merged : c.id;
    map.set(c.id, { id: c.id, variableId: c.variable_id, variable: variable.name, label: c.label, retired: c.retired || variable.retired, countsAs });
  }
  return map;
}
