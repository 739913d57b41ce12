import { Module } from '@nestjs/common';
import { MailSender } from './mail-sender.js';
import { MailService } from './mail.service.js';

/** MailService queues mail for any module; MailSender delivers it (jobs module's queue). */
@Module({
  providers: [MailService, MailSender],
  exports: [MailService],
})
export class MailModule {}
