import { Global, Inject, Module, OnApplicationShutdown } from '@nestjs/common';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import { JobQueue } from './job-queue.js';
import { JOB_QUEUE } from './jobs.constants.js';

/** The process's job queue, connecting from start-up and stopped on shutdown. */
@Global()
@Module({
  providers: [
    {
      provide: JOB_QUEUE,
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => {
        const queue = new JobQueue(config.databaseUrl);
        // Connects in the background: the API starts even while the database is down.
        queue.start().catch(() => undefined);
        return queue;
      },
    },
  ],
  exports: [JOB_QUEUE],
})
export class JobsModule implements OnApplicationShutdown {
  constructor(@Inject(JOB_QUEUE) private readonly queue: JobQueue) {}

  async onApplicationShutdown(): Promise<void> {
    await this.queue.stop();
  }
}
