import type { Knex } from 'knex';

// Which of an interview's cells made it over quota (full or closed when it arrived), so the
// board counts an over-quota interview on the cell that caused it, not on every cell it is in.
// Interviews stored before this column existed get the cells of theirs that are full or
// closed now: the nearest record there is, since counts only grow while targets stand.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('interviews', (t) => {
    t.specificType('over_quota_cells', 'uuid[]').notNullable().defaultTo('{}');
  });
  await knex.raw(`
    WITH achieved AS (
      SELECT c.id, c.category_ids, c.target, c.closed_at, count(i.id) AS n
        FROM quota_cells c
        LEFT JOIN interviews i ON i.project_id = c.project_id AND i.counted AND i.category_ids @> c.category_ids
       GROUP BY c.id)
    UPDATE interviews i
       SET over_quota_cells = coalesce((
             SELECT array_agg(a.id) FROM achieved a
              JOIN quota_cells c ON c.id = a.id
             WHERE c.project_id = i.project_id AND i.category_ids @> a.category_ids
               AND (a.closed_at IS NOT NULL OR a.n >= a.target)), '{}')
     WHERE i.over_quota`);
  await knex.raw('CREATE INDEX interviews_over_quota ON interviews (project_id) WHERE over_quota AND counted');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX interviews_over_quota');
  await knex.schema.alterTable('interviews', (t) => {
    t.dropColumn('over_quota_cells');
  });
}
