import type { Knex } from 'knex';

// Quality control (issue 11): the tables the rules, the review queue, the back-checks and the
// interviewers page share.
// - projects.quality_settings: the lead's changes to the defaults (api/src/quality/quality-settings.ts),
//   merged over them in code, so a new default reaches projects that never changed it.
// - projects.quality_seed: the seed of back-check selection (a hash of seed and interview id).
// - interview_findings: what the server's rules found on each interview (too short, overlapping,
//   out of hours, burst), each with its reason in words and the figures behind it; replaced
//   for a whole project each time the rules run again. Arrival flags stay in interviews.flags.
// - interviewer_tests: each tested interviewer's headline-answer test (p-value, adjusted
//   p-value, flagged or not, reason, figures), replaced with the findings.
// - review_decisions: the append-only audit trail of review decisions. A trigger refuses UPDATE
//   and DELETE, so no route (nor a careless query) can change what was decided.
// - backchecks: interviews selected for verification by call-back when they arrived, the
//   respondent reference from the agency's contact sheet (a code, deleted a set number of days
//   after the back-check) and the outcome a supervisor recorded.

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('projects', (t) => {
    t.jsonb('quality_settings').notNullable().defaultTo('{}');
    t.text('quality_seed').notNullable().defaultTo(knex.raw('md5(random()::text)'));
    t.timestamp('quality_checked_at', { useTz: true });
  });

  await knex.schema.createTable('interview_findings', (t) => {
    t.uuid('interview_id').notNullable().references('interviews.id').onDelete('CASCADE');
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.text('rule').notNullable();
    t.text('reason').notNullable();
    t.jsonb('figures').notNullable().defaultTo('{}');
    t.primary(['interview_id', 'rule']);
    t.index(['project_id', 'rule']);
  });

  await knex.schema.createTable('interviewer_tests', (t) => {
    t.uuid('project_id').notNullable().references('projects.id').onDelete('CASCADE');
    t.uuid('interviewer_id').notNullable().references('users.id');
    t.integer('completes').notNullable();
    t.double('p_value');
    t.double('adjusted_p_value');
    t.boolean('flagged').notNullable().defaultTo(false);
    t.text('reason').notNullable();
    t.jsonb('figures').notNullable().defaultTo('{}');
    t.primary(['project_id', 'interviewer_id']);
  });

  await knex.schema.createTable('review_decisions', (t) => {
    t.bigIncrements('id');
    t.uuid('project_id').notNullable().references('projects.id');
    t.uuid('interview_id').notNullable().references('interviews.id');
    t.text('action').notNullable();
    t.text('previous_status').notNullable();
    t.text('new_status').notNullable();
    t.text('reason').notNullable();
    t.uuid('decided_by').notNullable().references('users.id');
    t.timestamp('decided_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(['project_id', 'decided_at']);
    t.index(['interview_id']);
  });
  await knex.raw(`ALTER TABLE review_decisions ADD CONSTRAINT review_decisions_action_check
    CHECK (action IN ('approve', 'reject', 'reinstate'))`);
  await knex.raw(`ALTER TABLE review_decisions ADD CONSTRAINT review_decisions_status_check
    CHECK (previous_status IN ('pending', 'approved', 'rejected') AND new_status IN ('pending', 'approved', 'rejected'))`);
  await knex.raw(`ALTER TABLE review_decisions ADD CONSTRAINT review_decisions_reason_check CHECK (length(btrim(reason)) > 0)`);
  await knex.raw(`CREATE FUNCTION review_decisions_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION 'review decisions are an append-only audit trail: % is refused', TG_OP
        USING ERRCODE = 'insufficient_privilege';
    END $$`);
  await knex.raw(`CREATE TRIGGER review_decisions_append_only
    BEFORE UPDATE OR DELETE ON review_decisions
    FOR EACH ROW EXECUTE FUNCTION review_decisions_append_only()`);

  await knex.schema.createTable('backchecks', (t) => {
    t.uuid('interview_id').primary().references('interviews.id');
    t.uuid('project_id').notNullable().references('projects.id');
    t.uuid('interviewer_id').notNullable().references('users.id');
    /** The interviewer's back-check share when the interview arrived (the hash fell below it). */
    t.double('share_at_selection').notNullable();
    t.timestamp('selected_at', { useTz: true }).notNullable().defaultTo(knex.fn.now());
    /** A code from the agency's own contact sheet; never a name, address or phone number. */
    t.text('respondent_reference');
    t.timestamp('reference_deleted_at', { useTz: true });
    t.text('outcome');
    /** What differed, for a back-check that did not confirm the interview. */
    t.text('outcome_note');
    t.uuid('recorded_by').references('users.id');
    t.timestamp('recorded_at', { useTz: true });
    t.index(['project_id', 'outcome']);
    t.index(['project_id', 'interviewer_id']);
  });
  await knex.raw(`ALTER TABLE backchecks ADD CONSTRAINT backchecks_outcome_check
    CHECK (outcome IS NULL OR outcome IN ('confirmed', 'not_confirmed', 'not_reached'))`);
  await knex.raw(`ALTER TABLE backchecks ADD CONSTRAINT backchecks_recorded_check
    CHECK ((outcome IS NULL) = (recorded_at IS NULL) AND (outcome IS NULL) = (recorded_by IS NULL))`);
  await knex.raw(`ALTER TABLE backchecks ADD CONSTRAINT backchecks_note_check
    CHECK (outcome IS DISTINCT FROM 'not_confirmed' OR length(btrim(coalesce(outcome_note, ''))) > 0)`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('backchecks');
  await knex.raw('DROP TRIGGER review_decisions_append_only ON review_decisions');
  await knex.raw('DROP FUNCTION review_decisions_append_only()');
  await knex.schema.dropTable('review_decisions');
  await knex.schema.dropTable('interviewer_tests');
  await knex.schema.dropTable('interview_findings');
  await knex.schema.alterTable('projects', (t) => {
    t.dropColumn('quality_settings');
    t.dropColumn('quality_seed');
    t.dropColumn('quality_checked_at');
  });
}
