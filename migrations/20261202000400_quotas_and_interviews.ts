import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('projects', (t) => {
    t.text('headline_question').notNullable().defaultTo('');
    t.timestamp('targets_updated_at', { useTz: true });
  });

  await knex.schema.createTable('quota_variables', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.text('name').notNullable();
    t.integer('position').notNullable();
    t.boolean('interlocked').notNullable().defaultTo(false);
    // A variable dropped from the targets is kept (retired) so past interviews still read.
    t.boolean('retired').notNullable().defaultTo(false);
    t.unique(['project_id', 'name']);
  });

  await knex.schema.createTable('quota_categories', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('variable_id').notNullable().references('quota_variables.id').onDelete('CASCADE');
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.text('label').notNullable();
    t.integer('position').notNullable();
    /** Population share, normalised to sum to 1 within the variable. */
    t.double('share').notNullable();
    t.boolean('retired').notNullable().defaultTo(false);
    t.unique(['variable_id', 'label']);
    t.index(['project_id']);
  });

  // A quota cell: one interlocked cross of categories, or one category of a margin variable.
  await knex.schema.createTable('quota_cells', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.text('kind').notNullable();
    t.specificType('category_ids', 'uuid[]').notNullable();
    t.text('label').notNullable();
    t.integer('position').notNullable();
    t.integer('target').notNullable();
    t.timestamp('closed_at', { useTz: true });
    t.uuid('closed_by').references('users.id').onDelete('SET NULL');
    t.index(['project_id']);
  });
  await knex.raw(`ALTER TABLE quota_cells ADD CONSTRAINT quota_cells_kind_check CHECK (kind IN ('interlocked', 'margin'))`);
  await knex.raw(`CREATE UNIQUE INDEX quota_cells_project_categories ON quota_cells (project_id, category_ids)`);

  // One contact logged by an interviewer. The id is the device's UUID, which makes
  // uploads idempotent. Respondents are described only by their cells and answers.
  await knex.schema.createTable('interviews', (t) => {
    t.uuid('id').primary();
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.uuid('interviewer_id').notNullable().references('users.id');
    t.text('disposition').notNullable();
    t.specificType('category_ids', 'uuid[]').notNullable().defaultTo('{}');
    t.boolean('headline_answer');
    t.timestamp('started_at', { useTz: true }).notNullable();
    t.timestamp('ended_at', { useTz: true }).notNullable();
    t.date('field_day').notNullable();
    t.timestamp('received_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.boolean('over_quota').notNullable().defaultTo(false);
    t.text('review_status').notNullable().defaultTo('pending');
    t.index(['project_id', 'disposition', 'review_status']);
    t.index(['project_id', 'interviewer_id', 'field_day']);
  });
  await knex.raw(
    `ALTER TABLE interviews ADD CONSTRAINT interviews_disposition_check
       CHECK (disposition IN ('complete', 'partial', 'refusal', 'non_contact', 'other', 'not_eligible'))`,
  );
  await knex.raw(
    `ALTER TABLE interviews ADD CONSTRAINT interviews_review_status_check
       CHECK (review_status IN ('pending', 'approved', 'rejected'))`,
  );
  await knex.raw(
    `ALTER TABLE interviews ADD CONSTRAINT interviews_complete_check
       CHECK (disposition <> 'complete' OR (headline_answer IS NOT NULL AND cardinality(category_ids) > 0))`,
  );

  // Counted interviews (completes not rejected) per project and combination of categories,
  // kept by statement triggers. Quota boards and balances read these few rows instead of
  // every interview, so their cost follows the number of cells.
  await knex.schema.createTable('interview_counts', (t) => {
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.specificType('category_ids', 'uuid[]').notNullable();
    t.integer('n').notNullable();
    t.integer('yes').notNullable();
    t.integer('over_quota').notNullable();
    t.primary(['project_id', 'category_ids']);
  });
  const apply = (table: string, sign: string) => `
      INSERT INTO interview_counts AS c (project_id, category_ids, n, yes, over_quota)
      SELECT project_id, category_ids, ${sign}count(*), ${sign}count(*) FILTER (WHERE headline_answer),
             ${sign}count(*) FILTER (WHERE over_quota)
        FROM ${table}
       WHERE disposition = 'complete' AND review_status <> 'rejected'
       GROUP BY project_id, category_ids
      ON CONFLICT (project_id, category_ids) DO UPDATE
        SET n = c.n + EXCLUDED.n, yes = c.yes + EXCLUDED.yes, over_quota = c.over_quota + EXCLUDED.over_quota;`;
  await knex.raw(`
    CREATE FUNCTION interview_counts_apply() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_OP IN ('UPDATE', 'DELETE') THEN ${apply('old_rows', '-')} END IF;
      IF TG_OP IN ('INSERT', 'UPDATE') THEN ${apply('new_rows', '')} END IF;
      RETURN NULL;
    END $$`);
  await knex.raw(`CREATE TRIGGER interview_counts_insert AFTER INSERT ON interviews
    REFERENCING NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION interview_counts_apply()`);
  await knex.raw(`CREATE TRIGGER interview_counts_update AFTER UPDATE ON interviews
    REFERENCING OLD TABLE AS old_rows NEW TABLE AS new_rows FOR EACH STATEMENT EXECUTE FUNCTION interview_counts_apply()`);
  await knex.raw(`CREATE TRIGGER interview_counts_delete AFTER DELETE ON interviews
    REFERENCING OLD TABLE AS old_rows FOR EACH STATEMENT EXECUTE FUNCTION interview_counts_apply()`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('interview_counts');
  await knex.raw('DROP FUNCTION interview_counts_apply() CASCADE');
  await knex.schema.dropTable('interviews');
  await knex.schema.dropTable('quota_cells');
  await knex.schema.dropTable('quota_categories');
  await knex.schema.dropTable('quota_variables');
  await knex.schema.alterTable('projects', (t) => {
    t.dropColumn('headline_question');
    t.dropColumn('targets_updated_at');
  });
}
