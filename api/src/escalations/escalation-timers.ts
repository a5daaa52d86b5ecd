import { Injectable, Logger, type BeforeApplicationShutdown, type OnApplicationBootstrap } from '@nestjs/common';
import { DataSource, In } from 'typeorm';
import { Poller } from '../common/poller';
import type { AppConfig } from '../config/app-config';
import { InjectConfig } from '../config/config.module';
import { MailWorker } from '../mail/mail.worker';
import { Escalation } from '../scans/escalation.entity';
import { EscalationAlerts } from './escalation-alerts';

/** Escalations handled per round; the rest wait for the next round or another instance. */
const CLAIM_BATCH = 20;

/**
 * Reminders of unacknowledged escalations every ESCALATION_RENOTIFY_AFTER, and one mail to
 * ESCALATION_SECOND_CONTACT once ESCALATION_SECOND_CONTACT_AFTER has passed since arrival. The due
 * times live in the escalation rows, so a restart keeps them; every API instance runs a round every
 * MAIL_POLL_INTERVAL and claims due rows with `SELECT … FOR UPDATE SKIP LOCKED`, so each reminder is
 * queued by exactly one instance. Acknowledging clears `nextNotifyAt`; acknowledged and closed
 * escalations are never claimed.
 */
@Injectable()
export class EscalationTimers implements OnApplicationBootstrap, BeforeApplicationShutdown {
  private readonly logger = new Logger('EscalationTimers');
  private readonly poller: Poller;

  constructor(
    private readonly dataSource: DataSource,
    private readonly alerts: EscalationAlerts,
    private readonly mailWorker: MailWorker,
    @InjectConfig() private readonly config: AppConfig,
  ) {
    this.poller = new Poller('Escalation timer round', config.mail.pollIntervalSeconds * 1000, () => this.runDue(), this.logger);
  }

  onApplicationBootstrap(): void {
    this.poller.start();
  }

  async beforeApplicationShutdown(): Promise<void> {
    await this.poller.stop();
  }

  /** Runs a round now (or waits for the running one). */
  runNow(): Promise<void> {
    return this.poller.runNow();
  }

  /** One round: queues the due reminders and second-contact mails; returns how many mails were queued. */
  private async runDue(): Promise<number> {
    const queued = await this.dataSource.transaction('READ COMMITTED', async (manager) => {
      const now = new Date();
      const due: { id: string }[] = await manager.query(
        "SELECT id FROM escalations WHERE status = 'raised' AND deletedAt IS NULL " +
          'AND (nextNotifyAt <= ? OR (secondContactDueAt <= ? AND secondContactNotifiedAt IS NULL)) ' +
          'ORDER BY createdAt LIMIT ? FOR UPDATE SKIP LOCKED',
        [now, now, CLAIM_BATCH],
      );
      if (!due.length) return 0;
      const { renotifyAfterSeconds, secondContact } = this.config.escalationTimers;
      let mails = 0;
      for (const escalation of await manager.findBy(Escalation, { id: In(due.map((row) => row.id)) })) {
        if (escalation.nextNotifyAt && escalation.nextNotifyAt <= now) {
          const round = escalation.notifiedCount + 1;
          mails += await this.alerts.queue(manager, escalation, 'escalation.reminder', round);
          await manager.update(Escalation, { id: escalation.id }, { notifiedCount: round, nextNotifyAt: new Date(now.getTime() + renotifyAfterSeconds * 1000) });
        }
        if (escalation.secondContactDueAt && escalation.secondContactDueAt <= now && !escalation.secondContactNotifiedAt) {
          // Without a second contact configured any more, the due time is dropped rather than retried.
          if (secondContact) {
            mails += await this.alerts.queue(manager, escalation, 'escalation.second_contact', escalation.notifiedCount);
            await manager.update(Escalation, { id: escalation.id }, { secondContactNotifiedAt: now });
          } else {
            await manager.update(Escalation, { id: escalation.id }, { secondContactDueAt: null });
          }
        }
      }
      return mails;
    });
    // Committed: send them now rather than at the mail worker's next round.
    if (queued > 0) void this.mailWorker.wake();
    return queued;
  }
}
