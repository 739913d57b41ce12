// A static list of the migrations, so the same set runs from scripts (tsx) and
// from the test suites (Vitest) without Knex scanning a folder for files.
// Add each new migration here, in timestamp order.
import type { Knex } from 'knex';
import * as m0001 from './20261202000100_organisations_and_users.js';
import * as m0002 from './20261202000200_projects.js';
import * as m0003 from './20261202000300_sign_in_throttle.js';
import * as m0004 from './20261202000400_quotas_and_interviews.js';
import * as m0005 from './20261202000500_project_time_zone.js';
import * as m0006 from './20261202000600_interview_flags.js';
import * as m0007 from './20261202000700_interview_count_tables.js';
import * as m0008 from './20261202000800_joint_shares.js';
import * as m0009 from './20261202000900_over_quota_cells.js';
import * as m0010 from './20261202001000_sessions.js';
import * as m0011 from './20261202001010_sign_in_failures.js';
import * as m0020 from './20261202002000_accounts.js';
import * as m0030 from './20261202003000_quota_identity.js';
import * as m0400 from './20261202004000_headline_answers.js';
import * as m0410 from './20261202004100_interview_voids.js';
import * as m0051 from './20261202005100_assignments_and_archive.js';
import * as m0060 from './20261202006000_quality_control.js';
import * as m0062 from './20261202006200_review_queue_indexes.js';
import * as m0063 from './20261202006300_backchecks_follow_interviews.js';
import * as m0064 from './20261202006400_quota_full_and_eligibility.js';
import * as m0730 from './20261202007300_benchmarks.js';

const migrations: Record<string, Knex.Migration> = {
  '20261202000100_organisations_and_users': m0001,
  '20261202000200_projects': m0002,
  '20261202000300_sign_in_throttle': m0003,
  '20261202000400_quotas_and_interviews': m0004,
  '20261202000500_project_time_zone': m0005,
  '20261202000600_interview_flags': m0006,
  '20261202000700_interview_count_tables': m0007,
  '20261202000800_joint_shares': m0008,
  '20261202000900_over_quota_cells': m0009,
  '20261202001000_sessions': m0010,
  '20261202001010_sign_in_failures': m0011,
  '20261202002000_accounts': m0020,
  '20261202003000_quota_identity': m0030,
  '20261202004000_headline_answers': m0400,
  '20261202004100_interview_voids': m0410,
  '20261202005100_assignments_and_archive': m0051,
  '20261202006000_quality_control': m0060,
  '20261202006200_review_queue_indexes': m0062,
  '20261202006300_backchecks_follow_interviews': m0063,
  '20261202006400_quota_full_and_eligibility': m0064,
  '20261202007300_benchmarks': m0730,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations),
  getMigrationName: (name) => name,
  getMigration: async (name) => {
    const migration = migrations[name];
    if (!migration) throw new Error(`unknown migration ${name}`);
    return migration;
  },
};
