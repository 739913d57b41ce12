import type { Knex } from 'knex';

// Joint population shares of a project's interlocked variables, one row per combination of
// their categories (in the variables' order), as a census table gives them. When a project
// has them, its interlocked cells take these shares and weighting rakes to the cross; without
// them, cell targets are the product of the margins. Saved and replaced with the targets.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('quota_joint_shares', (t) => {
    t.uuid('id').primary().defaultTo(knex.raw('gen_random_uuid()'));
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.specificType('category_ids', 'uuid[]').notNullable();
    t.double('share').notNullable();
    t.unique(['project_id', 'category_ids']);
  });
  await knex.raw('ALTER TABLE quota_joint_shares ADD CONSTRAINT quota_joint_shares_share_check CHECK (share >= 0 AND share <= 1)');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('quota_joint_shares');
}
