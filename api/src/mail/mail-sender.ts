// Works on the mail queue: hands each message to the SMTP server named by SMTP_URL
// through nodemailer. A refused or failed delivery throws, so the job is tried again.
import { Inject, Injectable, Logger, OnApplicationBootstrap } from '@nestjs/common';
import nodemailer, { type Transporter } from 'nodemailer';
import { APP_CONFIG } from '../config/config.constants.js';
import type { AppConfig } from '../config/config.js';
import type { JobQueue } from '../jobs/job-queue.js';
import { JOB_QUEUE } from '../jobs/jobs.constants.js';
import { MAIL_QUEUE, type MailMessage } from './mail-message.js';

@Injectable()
export class MailSender implements OnApplicationBootstrap {
  private readonly logger = new Logger(MailSender.name);
  private readonly transport: Transporter;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @Inject(JOB_QUEUE) private readonly jobs: JobQueue,
  ) {
    this.transport = nodemailer.createTransport(config.accounts.smtpUrl);
  }

  onApplicationBootstrap(): void {
    if (!this.config.accounts.runJobs) return;
    // Not awaited: the worker starts once the queue has connected, which may be after an outage.
    this.jobs
      .work<MailMessage>(MAIL_QUEUE, (message) => this.send(message))
      .catch((error: unknown) => this.logger.error(`the mail worker did not start: ${String(error)}`));
  }

  async send(message: MailMessage): Promise<void> {
    try {
      const info = await this.transport.sendMail({ from: this.config.accounts.mailFrom, ...message });
      this.logger.log(`mail "${message.subject}" accepted by the SMTP server (${String(info.messageId)})`);
    } catch (error) {
      // Thrown on so the queue tries again later; the recipient's address stays out of the log.
      this.logger.warn(`mail "${message.subject}" not accepted by the SMTP server, will retry: ${String(error)}`);
      throw error;
    }
  }
}
