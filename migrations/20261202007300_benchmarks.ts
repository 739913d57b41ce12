import type { Knex } from 'knex';

// Issue 12, item 4: other polls on the same question (benchmarks), by method group, and the
// project's reconciliation settings. A method group's bias (none, a known factor, unknown) is
// stored once per group and applies to every poll in it; an unknown bias takes the project's
// spread prior (the typical size of such a bias), which the lead may change.

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('benchmark_groups', (t) => {
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.text('bias_kind').notNullable();
    t.double('bias_factor');
    t.primary(['project_id', 'name']);
  });
  await knex.raw(`ALTER TABLE benchmark_groups ADD CONSTRAINT benchmark_groups_bias_check CHECK (
    (bias_kind IN ('none', 'unknown') AND bias_factor IS NULL)
    OR (bias_kind = 'known' AND bias_factor > 0 AND bias_factor < 1))`);
  await knex.schema.createTable('benchmark_polls', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('project_id').notNullable();
    t.text('source').notNullable();
    t.date('field_start').notNullable();
    t.date('field_end').notNullable();
    t.text('method_group').notNullable();
    t.integer('yes').notNullable();
    t.integer('sample_size').notNullable();
    t.timestamp('created_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.foreign(['project_id', 'method_group']).references(['project_id', 'name']).inTable('benchmark_groups').onUpdate('CASCADE').onDelete('CASCADE');
    t.index(['project_id']);
  });
  await knex.raw(`ALTER TABLE benchmark_polls ADD CONSTRAINT benchmark_polls_counts_check
    CHECK (sample_size >= 1 AND yes >= 0 AND yes <= sample_size AND field_end >= field_start)`);
  await knex.schema.createTable('benchmark_settings', (t) => {
    t.uuid('project_id').primary().references('projects.id').onDelete('CASCADE');
    t.double('unknown_spread').notNullable();
  });
  await knex.raw(`ALTER TABLE benchmark_settings ADD CONSTRAINT benchmark_settings_spread_check
    CHECK (unknown_spread > 0 AND unknown_spread < 0.5)`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('benchmark_settings');
  await knex.schema.dropTable('benchmark_polls');
  await knex.schema.dropTable('benchmark_groups');
}
