import type { Knex } from 'knex';

// The review queue (api/src/review) lists a project's interviews newest first, flagged ones
// before the rest, a page at a time. The first index walks a project's interviews in that
// order, so a page reads about a page of rows; the second finds the interviews flagged on
// arrival or over quota (rejected ones too: only an approved interview stops showing flags)
// without reading the others.
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE INDEX interviews_review_order ON interviews (project_id, started_at DESC, id DESC)');
  await knex.raw('CREATE INDEX interviews_review_flagged ON interviews (project_id) WHERE cardinality(flags) > 0 OR over_quota');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX interviews_review_flagged');
  await knex.raw('DROP INDEX interviews_review_order');
}
