import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The safety officer's escalation workflow (acknowledge, notes, close, reminder timers) and the mail outbox. */
export class AddEscalationWorkflowAndMail1796270000000 implements MigrationInterface {
  name = 'AddEscalationWorkflowAndMail1796270000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'ALTER TABLE `escalations` ' +
        "MODIFY `status` enum ('raised', 'acknowledged', 'closed') NOT NULL DEFAULT 'raised', " +
        'ADD `acknowledgedBy` uuid NULL, ' +
        'ADD `acknowledgedByName` varchar(120) NULL, ' +
        'ADD `acknowledgedAt` datetime(3) NULL, ' +
        "ADD `actionTaken` enum ('evacuation_advised', 'ppe_required', 'specialist_team_called', 'no_action') NULL, " +
        "ADD `ppeLevel` enum ('A', 'B', 'C', 'D') NULL, " +
        'ADD `ackComment` text NULL, ' +
        'ADD `closedBy` uuid NULL, ' +
        'ADD `closedAt` datetime(3) NULL, ' +
        'ADD `closeComment` text NULL, ' +
        'ADD `notifiedCount` int NOT NULL DEFAULT 0, ' +
        'ADD `nextNotifyAt` datetime(3) NULL, ' +
        'ADD `secondContactDueAt` datetime(3) NULL, ' +
        'ADD `secondContactNotifiedAt` datetime(3) NULL, ' +
        'ADD INDEX `IDX_escalations_due` (`status`, `nextNotifyAt`)',
    );
    await queryRunner.query(
      'CREATE TABLE `escalation_notes` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`escalationId` uuid NOT NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        '`text` text NOT NULL, ' +
        '`authorId` uuid NOT NULL, ' +
        '`authorName` varchar(120) NOT NULL, ' +
        '`at` datetime(3) NOT NULL, ' +
        'INDEX `IDX_escalation_notes_syncSeq` (`syncSeq`), ' +
        'INDEX `IDX_escalation_notes_caseId` (`caseId`), ' +
        'INDEX `IDX_escalation_notes_escalationId` (`escalationId`, `at`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'ALTER TABLE `escalation_notes` ADD CONSTRAINT `FK_escalation_notes_escalation` ' +
        'FOREIGN KEY (`escalationId`) REFERENCES `escalations`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `escalation_notes` ADD CONSTRAINT `FK_escalation_notes_case` ' +
        'FOREIGN KEY (`caseId`) REFERENCES `cases`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'CREATE TABLE `mail_outbox` (' +
        '`id` uuid NOT NULL, ' +
        '`kind` varchar(40) NOT NULL, ' +
        '`refId` uuid NULL, ' +
        '`toAddress` varchar(254) NOT NULL, ' +
        '`subject` varchar(300) NOT NULL, ' +
        '`textBody` mediumtext NOT NULL, ' +
        '`sensitive` tinyint NOT NULL DEFAULT 0, ' +
        "`status` enum ('pending', 'sent') NOT NULL DEFAULT 'pending', " +
        '`attempts` int NOT NULL DEFAULT 0, ' +
        '`nextAttemptAt` datetime(3) NOT NULL, ' +
        '`lastError` varchar(1000) NULL, ' +
        '`sentAt` datetime(3) NULL, ' +
        '`messageId` varchar(250) NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        'INDEX `IDX_mail_outbox_due` (`status`, `nextAttemptAt`), ' +
        'INDEX `IDX_mail_outbox_ref` (`refId`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `mail_outbox`');
    await queryRunner.query('ALTER TABLE `escalation_notes` DROP FOREIGN KEY `FK_escalation_notes_case`');
    await queryRunner.query('ALTER TABLE `escalation_notes` DROP FOREIGN KEY `FK_escalation_notes_escalation`');
    await queryRunner.query('DROP TABLE `escalation_notes`');
    await queryRunner.query(
      'ALTER TABLE `escalations` DROP INDEX `IDX_escalations_due`, ' +
        'DROP COLUMN `secondContactNotifiedAt`, DROP COLUMN `secondContactDueAt`, DROP COLUMN `nextNotifyAt`, DROP COLUMN `notifiedCount`, ' +
        'DROP COLUMN `closeComment`, DROP COLUMN `closedAt`, DROP COLUMN `closedBy`, DROP COLUMN `ackComment`, DROP COLUMN `ppeLevel`, ' +
        'DROP COLUMN `actionTaken`, DROP COLUMN `acknowledgedAt`, DROP COLUMN `acknowledgedByName`, DROP COLUMN `acknowledgedBy`, ' +
        "MODIFY `status` enum ('raised') NOT NULL DEFAULT 'raised'",
    );
  }
}
