import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The supervisor's review: append-only decisions per case, when a case was submitted, and each scan's
 * first likely compound and hazard rank kept beside it so the review queue sorts and filters without
 * reading the results' JSON. Scans recorded before this migration keep rank 0 until they are pushed again.
 */
export class CreateReviewDecisions1796260000000 implements MigrationInterface {
  name = 'CreateReviewDecisions1796260000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE `review_decisions` (' +
        '`id` uuid NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`syncSeq` bigint NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`deletedAt` datetime(3) NULL, ' +
        '`caseId` uuid NOT NULL, ' +
        '`scanId` uuid NULL, ' +
        "`kind` enum ('accept', 'replace', 'needs_lab', 'return', 'sign_off', 'reopen') NOT NULL, " +
        '`compoundId` varchar(64) NULL, ' +
        '`compoundName` varchar(200) NULL, ' +
        '`reason` text NULL, ' +
        '`comment` text NULL, ' +
        '`revision` int NOT NULL, ' +
        '`decidedBy` uuid NOT NULL, ' +
        '`decidedByName` varchar(120) NOT NULL, ' +
        '`decidedAt` datetime(3) NOT NULL, ' +
        'INDEX `IDX_review_decisions_syncSeq` (`syncSeq`), ' +
        // Two decisions cannot take the same revision of a case.
        'UNIQUE INDEX `UQ_review_decisions_case_revision` (`caseId`, `revision`), ' +
        'INDEX `IDX_review_decisions_scanId` (`scanId`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'ALTER TABLE `review_decisions` ADD CONSTRAINT `FK_review_decisions_case` ' +
        'FOREIGN KEY (`caseId`) REFERENCES `cases`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query(
      'ALTER TABLE `review_decisions` ADD CONSTRAINT `FK_review_decisions_user` ' +
        'FOREIGN KEY (`decidedBy`) REFERENCES `users`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
    await queryRunner.query('ALTER TABLE `cases` ADD `submittedAt` datetime(3) NULL');
    await queryRunner.query(
      'ALTER TABLE `scans` ADD `likelyCompoundId` varchar(64) NULL, ADD `likelyCompoundName` varchar(200) NULL, ' +
        "ADD `hazardRank` tinyint NOT NULL DEFAULT '0'",
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `scans` DROP COLUMN `hazardRank`, DROP COLUMN `likelyCompoundName`, DROP COLUMN `likelyCompoundId`');
    await queryRunner.query('ALTER TABLE `cases` DROP COLUMN `submittedAt`');
    await queryRunner.query('ALTER TABLE `review_decisions` DROP FOREIGN KEY `FK_review_decisions_user`');
    await queryRunner.query('ALTER TABLE `review_decisions` DROP FOREIGN KEY `FK_review_decisions_case`');
    await queryRunner.query('DROP TABLE `review_decisions`');
  }
}
