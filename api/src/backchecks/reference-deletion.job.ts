import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import type { Knex } from 'knex';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { KNEX } from '../database/database.constants.js';
import type { JobQueue } from '../jobs/job-queue.js';
import { JOB_QUEUE } from '../jobs/jobs.constants.js';
import { deleteExpiredReferences, REFERENCE_DELETION_CRON, REFERENCE_DELETION_QUEUE } from './reference-deletion.js';

/** Deletes expired respondent references every hour through the job queue, and once at start-up. */
@Injectable()
export class ReferenceDeletionJob implements OnApplicationBootstrap {
  private readonly logger = new Logger(ReferenceDeletionJob.name);

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @Inject(JOB_QUEUE) private readonly jobs: JobQueue,
    @Inject(KNEX) private readonly db: Knex,
  ) {}

  onApplicationBootstrap(): void {
    if (!this.config.accounts.runJobs) return;
    // Not awaited: the queue connects in the background, perhaps after an outage.
    const run = () => this.run();
    Promise.all([
      this.jobs.work(REFERENCE_DELETION_QUEUE, run, 30),
      this.jobs.schedule(REFERENCE_DELETION_QUEUE, REFERENCE_DELETION_CRON, {}),
      this.jobs.send(REFERENCE_DELETION_QUEUE, {}),
    ]).catch((error: unknown) => this.logger.error(`the reference deletion job did not start: ${String(error)}`));
  }

  async run(): Promise<void> {
    const deleted = await deleteExpiredReferences(this.db);
    if (deleted > 0) this.logger.log(`deleted ${deleted} respondent references kept past their time`);
  }
}
