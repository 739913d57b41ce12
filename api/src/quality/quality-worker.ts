// Works on the quality-check queue (quality-jobs.ts) in every API instance that runs jobs.
import { Inject, Injectable, Logger, OnApplicationBootstrap } from '@nestjs/common';
import type { Knex } from 'knex';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { KNEX } from '../database/database.constants.js';
import type { JobQueue } from '../jobs/job-queue.js';
import { JOB_QUEUE } from '../jobs/jobs.constants.js';
import { runQualityCheck, type QualityCheckResult } from './quality-check.js';
import { QUALITY_QUEUE, type QualityJob } from './quality-jobs.js';

@Injectable()
export class QualityChecker implements OnApplicationBootstrap {
  private readonly logger = new Logger(QualityChecker.name);

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @Inject(JOB_QUEUE) private readonly jobs: JobQueue,
    @Inject(KNEX) private readonly db: Knex,
  ) {}

  onApplicationBootstrap(): void {
    if (!this.config.accounts.runJobs) return;
    this.jobs
      .work<QualityJob>(QUALITY_QUEUE, async ({ projectId }) => {
        const result = await this.run(projectId);
        this.logger.log(`quality check of project ${projectId}: ${result.findings} findings, ${result.interviewersFlagged} interviewers flagged`);
      })
      .catch((error: unknown) => this.logger.error(`the quality-check worker did not start: ${String(error)}`));
  }

  /** Runs the rules over the project now (the job does this; tests and the command line may too). */
  run(projectId: string): Promise<QualityCheckResult> {
    return runQualityCheck(this.db, projectId);
  }
}
