import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The hash-chained audit trail and its chain head. Triggers refuse UPDATE and DELETE on audit_log, so no
 * code path (nor a slip at the SQL prompt) can change an entry; whoever can drop the triggers could, and
 * that is what the hash chain and `GET /api/audit/verify` catch.
 */
export class CreateAuditLog1796280000000 implements MigrationInterface {
  name = 'CreateAuditLog1796280000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE `audit_log` (' +
        '`seq` bigint NOT NULL, ' +
        '`at` datetime(3) NOT NULL, ' +
        '`actorId` uuid NULL, ' +
        '`actorRole` varchar(20) NULL, ' +
        '`entity` varchar(40) NOT NULL, ' +
        '`entityId` varchar(64) NOT NULL, ' +
        '`caseId` uuid NULL, ' +
        '`action` varchar(40) NOT NULL, ' +
        '`before` longtext NULL, ' +
        '`after` longtext NULL, ' +
        '`prevHash` char(64) NOT NULL, ' +
        '`hash` char(64) NOT NULL, ' +
        'INDEX `IDX_audit_log_entity` (`entity`, `entityId`), ' +
        'INDEX `IDX_audit_log_caseId` (`caseId`), ' +
        'PRIMARY KEY (`seq`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `audit_chain_head` (' +
        '`id` tinyint NOT NULL, ' +
        '`lastSeq` bigint NOT NULL, ' +
        '`lastHash` char(64) NOT NULL, ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    // The genesis: no entry yet, and the first entry's prevHash is 64 zeros.
    await queryRunner.query("INSERT INTO `audit_chain_head` (`id`, `lastSeq`, `lastHash`) VALUES (1, 0, REPEAT('0', 64))");
    await queryRunner.query(
      'CREATE TRIGGER `audit_log_no_update` BEFORE UPDATE ON `audit_log` FOR EACH ROW ' +
        "SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit_log is append-only: entries cannot be changed'",
    );
    await queryRunner.query(
      'CREATE TRIGGER `audit_log_no_delete` BEFORE DELETE ON `audit_log` FOR EACH ROW ' +
        "SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit_log is append-only: entries cannot be deleted'",
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TRIGGER IF EXISTS `audit_log_no_delete`');
    await queryRunner.query('DROP TRIGGER IF EXISTS `audit_log_no_update`');
    await queryRunner.query('DROP TABLE `audit_chain_head`');
    await queryRunner.query('DROP TABLE `audit_log`');
  }
}
