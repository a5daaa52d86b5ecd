import { Module } from '@nestjs/common';
import { MailService } from './mail.service';
import { MailWorker } from './mail.worker';

/** Outgoing mail: the outbox worker and the SMTP transport. Others queue mails with `enqueueMails` in their own transaction. */
@Module({
  providers: [MailService, MailWorker],
  exports: [MailWorker],
})
export class MailModule {}
