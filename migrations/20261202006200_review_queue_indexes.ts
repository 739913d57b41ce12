import type { Knex } from 'knex';

// The review queue (api/src/review) lists a project's interviews newest first, flagged ones
// before the rest, a page at a time. This index walks a project's interviews in that order,
// so a page reads about a page of rows (and the rows it passes over) however many interviews
// the project has; whether each carries a flag is a condition on the row (review/flag-predicates.ts).
export async function up(knex: Knex): Promise<void> {
  await knex.raw('CREATE INDEX interviews_review_order ON interviews (project_id, started_at DESC, id DESC)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX interviews_review_order');
}
