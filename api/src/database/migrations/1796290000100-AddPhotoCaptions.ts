import type { MigrationInterface, QueryRunner } from 'typeorm';

/** An optional caption on photo attachments (what the photo shows, in the inspector's words). */
export class AddPhotoCaptions1796290000100 implements MigrationInterface {
  name = 'AddPhotoCaptions1796290000100';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `attachments` ADD `caption` varchar(500) NULL AFTER `contentType`');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `attachments` DROP COLUMN `caption`');
  }
}
