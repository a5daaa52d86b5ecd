import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module';
import { MailModule } from '../mail/mail.module';
import { EscalationAlerts } from './escalation-alerts';
import { EscalationTimers } from './escalation-timers';
import { EscalationsController } from './escalations.controller';
import { EscalationsService } from './escalations.service';

/** The safety officer's workflow on escalations (which arrive through sync), their mails and reminder timers. */
@Module({
  imports: [MailModule, AuditModule],
  controllers: [EscalationsController],
  providers: [EscalationsService, EscalationAlerts, EscalationTimers],
  exports: [EscalationAlerts],
})
export class EscalationsModule {}
