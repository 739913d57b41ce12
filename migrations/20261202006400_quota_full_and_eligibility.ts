import type { Knex } from 'knex';

// Issue 11, interviewers' rates: a new outcome, 'quota_full' ("turned away: cell full", the
// quota-filled code of the AAPOR Standard Definitions, a not-eligible case), and, for
// non-contacts and 'other' outcomes, whether the interviewer knows that someone eligible lives
// there (eligibility_known: true eligible, false or null unknown), which tells the AAPOR groups
// NC from UH and O from UO (api/src/interviewers/aapor-groups.ts). Null on every other outcome.

const OLD = ['complete', 'partial', 'refusal', 'non_contact', 'other', 'not_eligible'];
const NEW = [...OLD, 'quota_full'];

const check = (list: string[]) => `CHECK (disposition IN (${list.map((d) => `'${d}'`).join(', ')}))`;

export async function up(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE interviews DROP CONSTRAINT interviews_disposition_check`);
  await knex.raw(`ALTER TABLE interviews ADD CONSTRAINT interviews_disposition_check ${check(NEW)}`);
  await knex.raw(`ALTER TABLE interviews ADD COLUMN eligibility_known boolean`);
  await knex.raw(
    `ALTER TABLE interviews ADD CONSTRAINT interviews_eligibility_known_check
       CHECK (eligibility_known IS NULL OR disposition IN ('non_contact', 'other'))`,
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(`ALTER TABLE interviews DROP CONSTRAINT interviews_eligibility_known_check`);
  await knex.raw(`ALTER TABLE interviews DROP COLUMN eligibility_known`);
  // The outcome did not exist before: such contacts become 'not_eligible', the group they count in.
  await knex.raw(`UPDATE interviews SET disposition = 'not_eligible' WHERE disposition = 'quota_full'`);
  await knex.raw(`ALTER TABLE interviews DROP CONSTRAINT interviews_disposition_check`);
  await knex.raw(`ALTER TABLE interviews ADD CONSTRAINT interviews_disposition_check ${check(OLD)}`);
}
