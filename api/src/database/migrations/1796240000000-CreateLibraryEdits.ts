import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Supervisors' edits of the compound library: append-only, one row per save (add, edit, retire). */
export class CreateLibraryEdits1796240000000 implements MigrationInterface {
  name = 'CreateLibraryEdits1796240000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE `library_edits` (' +
        '`id` uuid NOT NULL, ' +
        '`compoundId` varchar(64) NOT NULL, ' +
        '`version` int NOT NULL, ' +
        '`document` json NOT NULL, ' +
        '`retired` tinyint NOT NULL DEFAULT 0, ' +
        '`editedBy` uuid NOT NULL, ' +
        '`editedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        // Two supervisors saving the same compound at once cannot both take the next version.
        'UNIQUE INDEX `UQ_library_edits_compound_version` (`compoundId`, `version`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    // RESTRICT: users are deactivated, never deleted, and an edit must keep naming its author.
    await queryRunner.query(
      'ALTER TABLE `library_edits` ADD CONSTRAINT `FK_library_edits_editor` ' +
        'FOREIGN KEY (`editedBy`) REFERENCES `users`(`id`) ON DELETE RESTRICT ON UPDATE NO ACTION',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `library_edits` DROP FOREIGN KEY `FK_library_edits_editor`');
    await queryRunner.query('DROP TABLE `library_edits`');
  }
}
