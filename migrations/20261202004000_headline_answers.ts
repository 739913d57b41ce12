import type { Knex } from 'knex';
import { countsFunction, recountSql, SHAPE_0700, type CountShape } from './lib/count-tables.js';

// The headline question takes four answers: yes, no, don't know and no answer (was a
// boolean). Weights are raked on every complete; the headline share is over those who
// answered yes or no (docs/methods.md, section 2), so the count tables also keep how many
// counted interviews said don't know and how many gave no answer.

export const HEADLINE_ANSWERS = ['yes', 'no', 'dont_know', 'no_answer'] as const;

export const SHAPE_4000: CountShape = {
  columns: SHAPE_0700.columns,
  measures: [
    { column: 'contacts', when: 'true' },
    { column: 'n', when: 'counted' },
    { column: 'yes', when: "counted AND headline_answer = 'yes'" },
    { column: 'dont_know', when: "counted AND headline_answer = 'dont_know'" },
    { column: 'no_answer', when: "counted AND headline_answer = 'no_answer'" },
    { column: 'over_quota', when: 'counted AND over_quota' },
  ],
};

const TABLES = ['interview_counts', 'interview_day_counts', 'interviewer_counts', 'interviewer_day_counts'];

export async function up(knex: Knex): Promise<void> {
  // The type change rewrites the table without firing the update trigger; it holds its lock
  // until this migration commits, so no interview arrives before the new function.
  await knex.raw(`ALTER TABLE interviews ALTER COLUMN headline_answer TYPE text
    USING CASE WHEN headline_answer THEN 'yes' WHEN NOT headline_answer THEN 'no' END`);
  await knex.raw(`ALTER TABLE interviews ADD CONSTRAINT interviews_headline_answer_check
    CHECK (headline_answer IN (${HEADLINE_ANSWERS.map((a) => `'${a}'`).join(', ')}))`);
  for (const table of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.integer('dont_know').notNullable().defaultTo(0);
      t.integer('no_answer').notNullable().defaultTo(0);
    });
  }
  await knex.raw(countsFunction(SHAPE_4000));
  for (const sql of recountSql(SHAPE_4000)) await knex.raw(sql);
}

export async function down(knex: Knex): Promise<void> {
  // Don't know and no answer have no boolean: they go back as false (no), the nearest a
  // yes/no column can hold (a complete must have an answer).
  await knex.raw('ALTER TABLE interviews DROP CONSTRAINT interviews_headline_answer_check');
  await knex.raw(`ALTER TABLE interviews ALTER COLUMN headline_answer TYPE boolean
    USING CASE WHEN headline_answer = 'yes' THEN true WHEN headline_answer IS NULL THEN NULL ELSE false END`);
  for (const table of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.dropColumn('dont_know');
      t.dropColumn('no_answer');
    });
  }
  await knex.raw(countsFunction(SHAPE_0700));
  for (const sql of recountSql(SHAPE_0700)) await knex.raw(sql);
}
