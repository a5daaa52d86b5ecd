import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Users with roles, and the refresh tokens of their sign-ins (rotation families). */
export class CreateUsersAndRefreshTokens1796152400000 implements MigrationInterface {
  name = 'CreateUsersAndRefreshTokens1796152400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    // The role list is frozen here on purpose: a new role needs a new migration, not an edit of this one.
    await queryRunner.query(
      'CREATE TABLE `users` (' +
        '`id` uuid NOT NULL, ' +
        '`email` varchar(254) NOT NULL, ' +
        '`displayName` varchar(120) NOT NULL, ' +
        "`role` enum ('inspector', 'supervisor', 'safety_officer', 'admin') NOT NULL, " +
        '`passwordHash` varchar(72) NOT NULL, ' +
        '`active` tinyint NOT NULL DEFAULT 1, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        '`version` int NOT NULL, ' +
        'UNIQUE INDEX `UQ_users_email` (`email`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'CREATE TABLE `refresh_tokens` (' +
        '`id` uuid NOT NULL, ' +
        '`userId` uuid NOT NULL, ' +
        '`tokenHash` char(64) NOT NULL, ' +
        '`familyId` uuid NOT NULL, ' +
        '`expiresAt` datetime(3) NOT NULL, ' +
        '`revokedAt` datetime(3) NULL, ' +
        '`replacedBy` uuid NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        'INDEX `IDX_refresh_tokens_familyId` (`familyId`), ' +
        'UNIQUE INDEX `UQ_refresh_tokens_tokenHash` (`tokenHash`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'ALTER TABLE `refresh_tokens` ADD CONSTRAINT `FK_refresh_tokens_user` ' +
        'FOREIGN KEY (`userId`) REFERENCES `users`(`id`) ON DELETE CASCADE ON UPDATE NO ACTION',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `refresh_tokens` DROP FOREIGN KEY `FK_refresh_tokens_user`');
    await queryRunner.query('DROP TABLE `refresh_tokens`');
    await queryRunner.query('DROP TABLE `users`');
  }
}
