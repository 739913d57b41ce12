import type { Knex } from 'knex';

// Quota variables and categories keep their identity through edits: saving targets updates
// rows by id, so a rename changes only the label. A retired row keeps its name for the
// interviews logged in it, so names must be unique only among the rows still active.
// A retired category may be merged into a current category of the same variable
// (`merged_into`): weighting and the balance then count its interviews there.
// A variable gets a file column name (`column_name`, snake_case) beside its display name
// (`name`): targets files, exports and the command line use the column name.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('quota_variables', (t) => {
    t.dropUnique(['project_id', 'name']);
    t.text('column_name');
  });
  // Backfill: lower case, every run of other characters one underscore, trimmed of underscores.
  await knex.raw(`
    UPDATE quota_variables
       SET column_name = COALESCE(NULLIF(trim(BOTH '_' FROM regexp_replace(lower(name), '[^a-z0-9]+', '_', 'g')), ''), 'variable_' || position)`);
  await knex.raw('ALTER TABLE quota_variables ALTER COLUMN column_name SET NOT NULL');
  await knex.raw('CREATE UNIQUE INDEX quota_variables_active_name ON quota_variables (project_id, lower(name)) WHERE NOT retired');
  await knex.raw('CREATE UNIQUE INDEX quota_variables_active_column ON quota_variables (project_id, column_name) WHERE NOT retired');
  await knex.schema.alterTable('quota_categories', (t) => {
    t.dropUnique(['variable_id', 'label']);
    t.uuid('merged_into').nullable().references('quota_categories.id').onDelete('SET NULL');
  });
  await knex.raw('CREATE UNIQUE INDEX quota_categories_active_label ON quota_categories (variable_id, lower(label)) WHERE NOT retired');
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw('DROP INDEX quota_categories_active_label');
  await knex.schema.alterTable('quota_categories', (t) => {
    t.dropColumn('merged_into');
  });
  // Retired rows that share a label with an active one make the old constraint impossible: rename them.
  await knex.raw(`
    UPDATE quota_categories c SET label = c.label || ' (retired ' || left(c.id::text, 8) || ')'
     WHERE c.retired AND EXISTS (SELECT 1 FROM quota_categories o WHERE o.variable_id = c.variable_id AND o.label = c.label AND o.id <> c.id)`);
  await knex.schema.alterTable('quota_categories', (t) => t.unique(['variable_id', 'label']));
  await knex.raw('DROP INDEX quota_variables_active_column');
  await knex.raw('DROP INDEX quota_variables_active_name');
  await knex.raw(`
    UPDATE quota_variables v SET name = v.name || ' (retired ' || left(v.id::text, 8) || ')'
     WHERE v.retired AND EXISTS (SELECT 1 FROM quota_variables o WHERE o.project_id = v.project_id AND o.name = v.name AND o.id <> v.id)`);
  await knex.schema.alterTable('quota_variables', (t) => {
    t.dropColumn('column_name');
    t.unique(['project_id', 'name']);
  });
}
