import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { Case } from '../cases/case.entity';
import type { AppConfig } from '../config/app-config';
import { InjectConfig } from '../config/config.module';
import { enqueueMails } from '../mail/mail-outbox';
import { Escalation } from '../scans/escalation.entity';
import { Scan } from '../scans/scan.entity';
import type { SyncedRecord } from '../sync/synced-record';
import type { SyncWriteListener } from '../sync/sync-handler';
import { User } from '../users/user.entity';
import { escalationMail, likelyCompoundNames, type EscalationMailKind } from './escalation-mail';

/**
 * Mails about escalations, always queued in the caller's transaction: the first round to every active
 * safety officer in the push that brings the escalation (as a sync write listener), reminders and the
 * second contact from the timers.
 */
@Injectable()
export class EscalationAlerts implements SyncWriteListener {
  readonly entity = 'escalation' as const;

  constructor(@InjectConfig() private readonly config: AppConfig) {}

  /** A new escalation arrived through sync: mail the safety officers and start its timers. */
  async afterWrite(manager: EntityManager, row: SyncedRecord, change: { isNew: boolean }): Promise<void> {
    if (!change.isNew) return;
    const escalation = row as Escalation;
    const now = Date.now();
    const { renotifyAfterSeconds, secondContact, secondContactAfterSeconds } = this.config.escalationTimers;
    await this.queue(manager, escalation, 'escalation.raised', 1);
    await manager.update(
      Escalation,
      { id: escalation.id },
      {
        notifiedCount: 1,
        nextNotifyAt: new Date(now + renotifyAfterSeconds * 1000),
        secondContactDueAt: secondContact ? new Date(now + secondContactAfterSeconds * 1000) : null,
      },
    );
  }

  /**
   * Queues one mail about the escalation to each recipient: the active safety officers, or for the
   * second contact the configured address. Returns how many were queued.
   */
  async queue(manager: EntityManager, escalation: Escalation, kind: EscalationMailKind, round: number): Promise<number> {
    const recipients =
      kind === 'escalation.second_contact'
        ? this.config.escalationTimers.secondContact
          ? [this.config.escalationTimers.secondContact]
          : []
        : (await manager.find(User, { where: { role: 'safety_officer', active: true }, order: { email: 'ASC' } })).map((user) => user.email);
    if (!recipients.length) return 0;
    const caseRow = await manager.findOneByOrFail(Case, { id: escalation.caseId });
    const inspector = await manager.findOneBy(User, { id: escalation.raisedBy });
    const scan = escalation.scanId ? await manager.findOneBy(Scan, { id: escalation.scanId }) : null;
    const { subject, text } = escalationMail(kind, {
      escalation,
      siteName: caseRow.siteName,
      address: caseRow.address,
      inspectorName: inspector?.displayName ?? 'an inspector',
      compounds: likelyCompoundNames(scan?.result),
      publicUrl: this.config.mail.publicUrl,
      round,
    });
    await enqueueMails(
      manager,
      recipients.map((to) => ({ kind, refId: escalation.id, to, subject, text })),
    );
    return recipients.length;
  }
}
