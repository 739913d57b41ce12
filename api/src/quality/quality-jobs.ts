// When the quality rules run again: a job per project on the pg-boss queue, queued after a
// sync stored interviews, after the lead changed the rules, and after the field dates or time
// zone changed. The queue keeps at most one waiting job per project (policy "short",
// singleton key = project), so a burst of syncs costs one run; runs themselves are one at a
// time per project (quality-check.ts).
import { Inject, Injectable, Logger, Optional } from '@nestjs/common';
import type { JobQueue, QueueDefinition } from '../jobs/job-queue.js';
import { JOB_QUEUE } from '../jobs/jobs.constants.js';

export const QUALITY_QUEUE: QueueDefinition = { name: 'quality-check', retryLimit: 3, retryDelaySeconds: 10, policy: 'short' };

export interface QualityJob {
  projectId: string;
}

@Injectable()
export class QualityScheduler {
  private readonly logger = new Logger(QualityScheduler.name);

  /** Without a queue (the demo seed, which runs the check itself) nothing is queued. */
  constructor(@Optional() @Inject(JOB_QUEUE) private readonly jobs: JobQueue | null = null) {}

  /**
   * Queues a run for the project. Never awaited by the caller's reply and never fails it: a
   * queue that cannot be reached only delays the flags until the next change.
   */
  queue(projectId: string): void {
    if (!this.jobs) return;
    this.jobs
      .sendOnce<QualityJob>(QUALITY_QUEUE, { projectId }, projectId)
      .catch((error: unknown) => this.logger.warn(`quality check for project ${projectId} not queued: ${String(error)}`));
  }
}
