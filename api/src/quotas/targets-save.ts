// Writes a set of targets over a project's saved ones, keeping identity: a variable or
// category sent with its id is the same row (a rename changes only its name or label); one
// sent without an id takes a retired row of the same name or label back (so a file read in
// again keeps its ids), or is new; saved rows not sent are retired, kept for the interviews
// logged in them and closed for new ones. Ids that are not this project's change nothing.
import type { Knex } from 'knex';
import type { QuotaCategoryRow, QuotaVariableRow } from '../database/tables.js';
import type { SaveTargetsDto } from './dto/targets.dto.js';
import { columnNameOf, invalid } from './targets-check.js';

/** Refuses ids that are not this project's variables, or not the categories of the variable they are sent with. */
function checkIds(dto: SaveTargetsDto, variables: QuotaVariableRow[], categories: QuotaCategoryRow[]): void {
  const variableIds = new Set(variables.map((v) => v.id));
  dto.variables.forEach((v, i) => {
    const id = v.id?.toLowerCase();
    if (id !== undefined && !variableIds.has(id)) {
      throw invalid(`variable ${v.name.trim()}: ${id} is not a quota variable of this project`, `variables.${i}.id`);
    }
    v.categories.forEach((c, j) => {
      const row = c.id === undefined ? undefined : categories.find((k) => k.id === c.id!.toLowerCase());
      if (c.id !== undefined && (!row || row.variable_id !== id)) {
        throw invalid(`variable ${v.name.trim()}: category "${c.label.trim()}": ${c.id.toLowerCase()} is not a category of this variable`, `variables.${i}.categories.${j}.id`);
      }
    });
  });
}

/** Takes the row with this id, or else an unclaimed saved row with this name (any case). */
function claim<T extends { id: string }>(rows: T[], claimed: Set<string>, id: string | undefined, sameName: (row: T) => boolean): T | undefined {
  const row = id !== undefined ? rows.find((r) => r.id === id.toLowerCase()) : rows.find((r) => !claimed.has(r.id) && sameName(r));
  if (row) claimed.add(row.id);
  return row;
}

export async function writeTargets(
  trx: Knex.Transaction,
  projectId: string,
  dto: SaveTargetsDto,
  fromJoint: Map<string, Map<string, number>> | null,
): Promise<void> {
  const variables = await trx('quota_variables').where({ project_id: projectId });
  const categories = await trx('quota_categories').where({ project_id: projectId });
  checkIds(dto, variables, categories);
  const sent = new Set(dto.variables.flatMap((v) => [v.id, ...v.categories.map((c) => c.id)]).filter((id) => id !== undefined).map((id) => id.toLowerCase()));
  const claimed = new Set(sent);
  await trx('quota_variables').where({ project_id: projectId }).update({ retired: true });
  await trx('quota_categories').where({ project_id: projectId }).update({ retired: true });
  for (const [position, v] of dto.variables.entries()) {
    const name = v.name.trim();
    const fields = { name, column_name: columnNameOf(v), position, interlocked: Boolean(v.interlocked), retired: false };
    const kept = claim(variables, claimed, v.id, (r) => r.name.toLowerCase() === name.toLowerCase() || r.column_name === fields.column_name);
    const variableId = kept
      ? (await trx('quota_variables').where({ id: kept.id }).update(fields).returning('id'))[0]!.id
      : (await trx('quota_variables').insert({ project_id: projectId, ...fields }).returning('id'))[0]!.id;
    // An interlocked variable with joint shares takes its margin from the table.
    const joint = fromJoint?.get(name);
    const shareOf = (c: { label: string; share: number }) => joint?.get(c.label.trim()) ?? c.share;
    const total = v.categories.reduce((s, c) => s + shareOf(c), 0);
    const own = categories.filter((c) => c.variable_id === variableId);
    for (const [i, c] of v.categories.entries()) {
      const label = c.label.trim();
      const row = { label, position: i, share: shareOf(c) / total, retired: false, merged_into: null };
      const same = claim(own, claimed, c.id, (r) => r.label.toLowerCase() === label.toLowerCase());
      if (same) await trx('quota_categories').where({ id: same.id }).update(row);
      else await trx('quota_categories').insert({ variable_id: variableId, project_id: projectId, ...row });
    }
  }
}
