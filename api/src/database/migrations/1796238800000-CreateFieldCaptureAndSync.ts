import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Field capture and sync: cases, samples, hand-overs, instrument checks, scans, site notes, escalations and
 * attachment metadata (bytes live in object storage), the sync counter and the processed-change log.
 */
export class CreateFieldCaptureAndSync1796238800000 implements MigrationInterface {
  name = 'CreateFieldCaptureAndSync1796238800000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // Enum lists are frozen here on purpose: a new status or kind needs a new migration.
    await queryRunner.query(
      'CREATE TABLE `cases` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`siteName` varchar(200) NOT NULL, ' +
        '`address` varchar(500) NULL, ' +
        '`latitude` double NULL, ' +
        '`longitude` double NULL, ' +
        '`locationAccuracyM` double NULL, ' +
        '`locationEnteredByHand` tinyint NOT NULL DEFAULT 0, ' +
        '`startedAt` datetime(3) NOT NULL, ' +
        '`weatherNotes` text NULL, ' +
        '`accessNotes` text NULL, ' +
        '`inspectorId` uuid NOT NULL, ' +
        "`status` enum ('open', 'submitted', 'in_review', 'accepted', 'returned') NOT NULL DEFAULT 'open', " +
        'INDEX `IDX_cases_inspectorId` (`inspectorId`), ' +
        'INDEX `IDX_cases_syncSeq` (`syncSeq`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `sync_counter` (' +
        '`id` tinyint NOT NULL, ' +
        '`value` bigint NOT NULL, ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `attachments` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        "`ownerType` enum ('case', 'sample', 'scan') NOT NULL, " +
        '`ownerId` uuid NOT NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        "`kind` enum ('photo', 'raw-scan') NOT NULL, " +
        '`fileName` varchar(255) NOT NULL, ' +
        '`contentType` varchar(100) NOT NULL, ' +
        '`size` int NOT NULL, ' +
        '`sha256` char(64) NOT NULL, ' +
        "`receivedBytes` int NOT NULL DEFAULT '0', " +
        '`storageKey` varchar(300) NULL, ' +
        '`uploadedAt` datetime(3) NULL, ' +
        'INDEX `IDX_attachments_owner` (`ownerType`, `ownerId`), ' +
        'INDEX `IDX_attachments_caseId` (`caseId`), ' +
        'INDEX `IDX_attachments_syncSeq` (`syncSeq`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `samples` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        '`label` varchar(120) NOT NULL, ' +
        '`container` varchar(200) NULL, ' +
        '`description` text NULL, ' +
        '`locationOnSite` varchar(500) NULL, ' +
        '`observations` json NOT NULL, ' +
        '`collectedBy` varchar(120) NOT NULL, ' +
        '`collectedAt` datetime(3) NOT NULL, ' +
        '`sealNumber` varchar(60) NULL, ' +
        'INDEX `IDX_samples_caseId` (`caseId`), ' +
        'INDEX `IDX_samples_syncSeq` (`syncSeq`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `scans` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`sampleId` uuid NOT NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        "`technique` enum ('ir', 'raman') NOT NULL, " +
        "`phase` enum ('condensed', 'gas') NOT NULL, " +
        '`excitationNm` double NULL, ' +
        '`recordedAt` datetime(3) NOT NULL, ' +
        '`instrumentCheckId` uuid NULL, ' +
        '`rawAttachmentId` uuid NULL, ' +
        '`rawSha256` char(64) NULL, ' +
        '`parsedSummary` json NULL, ' +
        '`result` json NULL, ' +
        '`inspectorAcknowledgedAt` datetime(3) NULL, ' +
        '`serverResult` json NULL, ' +
        '`resultMismatch` tinyint NULL, ' +
        '`serverRecomputedAt` datetime(3) NULL, ' +
        'INDEX `IDX_scans_caseId` (`caseId`), ' +
        'INDEX `IDX_scans_sampleId` (`sampleId`), ' +
        'INDEX `IDX_scans_syncSeq` (`syncSeq`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `site_notes` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        '`sampleId` uuid NULL, ' +
        '`text` text NOT NULL, ' +
        '`recordedAt` datetime(3) NOT NULL, ' +
        '`authorId` uuid NOT NULL, ' +
        'INDEX `IDX_site_notes_caseId` (`caseId`), ' +
        'INDEX `IDX_site_notes_syncSeq` (`syncSeq`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `handovers` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`sampleId` uuid NOT NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        '`fromParty` varchar(120) NOT NULL, ' +
        '`toParty` varchar(120) NOT NULL, ' +
        '`handedOverAt` datetime(3) NOT NULL, ' +
        '`sealNumber` varchar(60) NULL, ' +
        '`note` text NULL, ' +
        'INDEX `IDX_handovers_caseId` (`caseId`), ' +
        'INDEX `IDX_handovers_sampleId` (`sampleId`), ' +
        'INDEX `IDX_handovers_syncSeq` (`syncSeq`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `escalations` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        '`scanId` uuid NULL, ' +
        '`raisedBy` uuid NOT NULL, ' +
        '`raisedAt` datetime(3) NOT NULL, ' +
        '`reason` text NOT NULL, ' +
        '`hazardClasses` json NOT NULL, ' +
        "`status` enum ('raised') NOT NULL DEFAULT 'raised', " +
        'INDEX `IDX_escalations_caseId` (`caseId`), ' +
        'INDEX `IDX_escalations_syncSeq` (`syncSeq`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `instrument_checks` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        '`standardId` varchar(60) NOT NULL, ' +
        '`performedAt` datetime(3) NOT NULL, ' +
        '`passed` tinyint NOT NULL, ' +
        '`offsets` json NOT NULL, ' +
        '`performedBy` uuid NOT NULL, ' +
        'INDEX `IDX_instrument_checks_caseId` (`caseId`), ' +
        'INDEX `IDX_instrument_checks_syncSeq` (`syncSeq`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `sync_changes` (' +
        '`changeId` uuid NOT NULL, ' +
        '`userId` uuid NOT NULL, ' +
        '`clientId` varchar(100) NOT NULL, ' +
        '`batchId` uuid NOT NULL, ' +
        '`entity` varchar(20) NOT NULL, ' +
        '`recordId` uuid NULL, ' +
        '`status` varchar(10) NOT NULL, ' +
        '`version` int NULL, ' +
        '`reason` varchar(1000) NULL, ' +
        '`processedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        'INDEX `IDX_sync_changes_user` (`userId`, `processedAt`), ' +
        'PRIMARY KEY (`changeId`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'ALTER TABLE `cases` ADD CONSTRAINT `FK_cases_inspector` ' +
        'FOREIGN KEY (`inspectorId`) REFERENCES `users`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `attachments` ADD CONSTRAINT `FK_attachments_case` ' +
        'FOREIGN KEY (`caseId`) REFERENCES `cases`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `samples` ADD CONSTRAINT `FK_samples_case` ' +
        'FOREIGN KEY (`caseId`) REFERENCES `cases`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `scans` ADD CONSTRAINT `FK_scans_sample` ' +
        'FOREIGN KEY (`sampleId`) REFERENCES `samples`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `site_notes` ADD CONSTRAINT `FK_site_notes_case` ' +
        'FOREIGN KEY (`caseId`) REFERENCES `cases`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `handovers` ADD CONSTRAINT `FK_handovers_sample` ' +
        'FOREIGN KEY (`sampleId`) REFERENCES `samples`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `escalations` ADD CONSTRAINT `FK_escalations_case` ' +
        'FOREIGN KEY (`caseId`) REFERENCES `cases`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `instrument_checks` ADD CONSTRAINT `FK_instrument_checks_case` ' +
        'FOREIGN KEY (`caseId`) REFERENCES `cases`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    // The single counter row every synced write locks and advances.
    await queryRunner.query('INSERT INTO `sync_counter` (`id`, `value`) VALUES (1, 0)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `instrument_checks` DROP FOREIGN KEY `FK_instrument_checks_case`');
    await queryRunner.query('ALTER TABLE `escalations` DROP FOREIGN KEY `FK_escalations_case`');
    await queryRunner.query('ALTER TABLE `handovers` DROP FOREIGN KEY `FK_handovers_sample`');
    await queryRunner.query('ALTER TABLE `site_notes` DROP FOREIGN KEY `FK_site_notes_case`');
    await queryRunner.query('ALTER TABLE `scans` DROP FOREIGN KEY `FK_scans_sample`');
    await queryRunner.query('ALTER TABLE `samples` DROP FOREIGN KEY `FK_samples_case`');
    await queryRunner.query('ALTER TABLE `attachments` DROP FOREIGN KEY `FK_attachments_case`');
    await queryRunner.query('ALTER TABLE `cases` DROP FOREIGN KEY `FK_cases_inspector`');
    await queryRunner.query('DROP TABLE `sync_changes`');
    await queryRunner.query('DROP TABLE `instrument_checks`');
    await queryRunner.query('DROP TABLE `escalations`');
    await queryRunner.query('DROP TABLE `handovers`');
    await queryRunner.query('DROP TABLE `site_notes`');
    await queryRunner.query('DROP TABLE `scans`');
    await queryRunner.query('DROP TABLE `samples`');
    await queryRunner.query('DROP TABLE `attachments`');
    await queryRunner.query('DROP TABLE `sync_counter`');
    await queryRunner.query('DROP TABLE `cases`');
  }
}
