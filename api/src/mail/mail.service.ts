// The one way to send mail: queue it. The message waits in PostgreSQL until a worker of
// any API instance has handed it to the SMTP server (mail-sender.ts), so a restart loses nothing.
import { Inject, Injectable } from '@nestjs/common';
import type { JobQueue } from '../jobs/job-queue.js';
import { JOB_QUEUE } from '../jobs/jobs.constants.js';
import { MAIL_QUEUE, type MailMessage } from './mail-message.js';

@Injectable()
export class MailService {
  constructor(@Inject(JOB_QUEUE) private readonly jobs: JobQueue) {}

  /** Queues the message; resolves with the job's id once it is stored. */
  queue(message: MailMessage): Promise<string> {
    return this.jobs.send(MAIL_QUEUE, message);
  }
}
