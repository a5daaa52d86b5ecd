import { Injectable, Logger, type BeforeApplicationShutdown, type OnApplicationBootstrap } from '@nestjs/common';
import { backoffDelayMs } from '@siteband/shared';
import { DataSource, In } from 'typeorm';
import { Poller } from '../common/poller';
import type { AppConfig } from '../config/app-config';
import { InjectConfig } from '../config/config.module';
import { MailOutbox } from './mail-outbox.entity';
import { MailService } from './mail.service';

/** Mails claimed per round; the others wait for the next round or another instance. */
const CLAIM_BATCH = 20;

/**
 * Sends the outbox. Every API instance runs one; each round claims due rows with
 * `SELECT … FOR UPDATE SKIP LOCKED`, so two instances never take the same mail, and holds the claim
 * while sending. A failed send keeps the mail pending with a later `nextAttemptAt` (exponential backoff);
 * nothing is dropped. Delivery is at least once: only a crash between the relay's acceptance and the
 * commit sends a mail twice.
 */
@Injectable()
export class MailWorker implements OnApplicationBootstrap, BeforeApplicationShutdown {
  private readonly logger = new Logger('MailWorker');
  private readonly poller: Poller;

  constructor(
    private readonly dataSource: DataSource,
    private readonly mail: MailService,
    @InjectConfig() private readonly config: AppConfig,
  ) {
    this.poller = new Poller('Mail round', config.mail.pollIntervalSeconds * 1000, () => this.sendDue(), this.logger);
  }

  onApplicationBootstrap(): void {
    this.poller.start();
  }

  async beforeApplicationShutdown(): Promise<void> {
    await this.poller.stop();
  }

  /** Runs a round now (or waits for the running one): e.g. right after something queued a mail. */
  wake(): Promise<void> {
    return this.poller.runNow();
  }

  /** One round: claims up to CLAIM_BATCH due mails, sends them, records each outcome. Returns how many were sent. */
  private async sendDue(): Promise<number> {
    // READ COMMITTED: the locking read takes no gap locks, so it never blocks writers queueing new mails.
    return this.dataSource.transaction('READ COMMITTED', async (manager) => {
      const now = new Date();
      const claimed: { id: string }[] = await manager.query(
        "SELECT id FROM mail_outbox WHERE status = 'pending' AND nextAttemptAt <= ? ORDER BY nextAttemptAt, createdAt LIMIT ? FOR UPDATE SKIP LOCKED",
        [now, CLAIM_BATCH],
      );
      if (!claimed.length) return 0;
      const rows = await manager.findBy(MailOutbox, { id: In(claimed.map((row) => row.id)) });
      let sent = 0;
      for (const row of rows) {
        try {
          const messageId = await this.mail.send({ to: row.toAddress, subject: row.subject, text: row.textBody });
          await manager.update(MailOutbox, { id: row.id }, {
            status: 'sent',
            sentAt: new Date(),
            messageId: messageId.slice(0, 250),
            attempts: row.attempts + 1,
            lastError: null,
            ...(row.sensitive ? { textBody: '' } : {}),
          });
          sent += 1;
        } catch (error) {
          const attempts = row.attempts + 1;
          const { retryBaseSeconds, retryMaxSeconds } = this.config.mail;
          const delay = backoffDelayMs(attempts, { baseMs: retryBaseSeconds * 1000, maxMs: retryMaxSeconds * 1000 });
          const reason = error instanceof Error ? error.message : String(error);
          await manager.update(MailOutbox, { id: row.id }, { attempts, nextAttemptAt: new Date(Date.now() + delay), lastError: reason.slice(0, 1000) });
          this.logger.warn(`Mail ${row.id} (${row.kind}) not sent, attempt ${attempts}, next in ${Math.round(delay / 1000)} s: ${reason}`);
        }
      }
      return sent;
    });
  }
}
