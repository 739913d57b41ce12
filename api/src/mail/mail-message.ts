/** One e-mail as it waits on the queue: plain text always, HTML when the sender has it. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** The queue outgoing mail waits on (jobs/job-queue.ts); a failed send is retried with backoff. */
export const MAIL_QUEUE = { name: 'mail-send', retryLimit: 8, retryDelaySeconds: 15 } as const;
