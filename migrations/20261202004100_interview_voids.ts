import type { Knex } from 'knex';
import { countsFunction, recountSql, type CountShape } from './lib/count-tables.js';
import { SHAPE_4000 } from './20261202004000_headline_answers.js';

// An interviewer may void a contact already sent (logged by mistake), with a reason: the
// row stays, with who voided it, when and why, for the supervisor. A voided interview stops
// counting. The one definition of a counted interview is still `interviews.counted`, now a
// complete that is neither rejected on review nor voided; the code's `counted()`
// (api/src/interviews/counted.ts) restates it for rows not yet stored and points here. A
// voided contact also leaves the contact counts. Existing rows are counted again.

const COUNTED = (voided: boolean) =>
  `disposition = 'complete' AND review_status <> 'rejected'${voided ? ' AND voided_at IS NULL' : ''}`;

export const SHAPE_4100: CountShape = {
  columns: `${SHAPE_4000.columns}, (voided_at IS NOT NULL) AS voided`,
  measures: [{ column: 'contacts', when: 'NOT voided' }, ...SHAPE_4000.measures.slice(1)],
};

async function redefineCounted(knex: Knex, voided: boolean): Promise<void> {
  // PostgreSQL 15 cannot change a generated column's expression: drop it and add it again.
  await knex.raw('DROP INDEX interviews_over_quota');
  await knex.raw('ALTER TABLE interviews DROP COLUMN counted');
  await knex.raw(`ALTER TABLE interviews ADD COLUMN counted boolean NOT NULL GENERATED ALWAYS AS (${COUNTED(voided)}) STORED`);
  await knex.raw('CREATE INDEX interviews_over_quota ON interviews (project_id) WHERE over_quota AND counted');
}

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('interviews', (t) => {
    t.timestamp('voided_at', { useTz: true });
    t.uuid('voided_by').references('users.id');
    t.text('void_reason');
  });
  await knex.raw(`ALTER TABLE interviews ADD CONSTRAINT interviews_void_check
    CHECK ((voided_at IS NULL) = (voided_by IS NULL) AND (voided_at IS NULL) = (void_reason IS NULL))`);
  await redefineCounted(knex, true);
  await knex.raw(countsFunction(SHAPE_4100));
  for (const sql of recountSql(SHAPE_4100)) await knex.raw(sql);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(countsFunction(SHAPE_4000));
  await redefineCounted(knex, false);
  await knex.raw('ALTER TABLE interviews DROP CONSTRAINT interviews_void_check');
  await knex.schema.alterTable('interviews', (t) => {
    t.dropColumn('voided_at');
    t.dropColumn('voided_by');
    t.dropColumn('void_reason');
  });
  for (const sql of recountSql(SHAPE_4000)) await knex.raw(sql);
}
