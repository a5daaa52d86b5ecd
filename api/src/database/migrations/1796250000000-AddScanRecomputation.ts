import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The server's recomputation of a scan: how it differs from the tablet's result, and why it failed. */
export class AddScanRecomputation1796250000000 implements MigrationInterface {
  name = 'AddScanRecomputation1796250000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `scans` ADD `mismatch` json NULL, ADD `serverRecomputeError` varchar(1000) NULL');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `scans` DROP COLUMN `serverRecomputeError`, DROP COLUMN `mismatch`');
  }
}
