import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Invitations by e-mail: an invited user has no password until they set one through the single-use link. */
export class AddUserInvitations1796270000001 implements MigrationInterface {
  name = 'AddUserInvitations1796270000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `users` MODIFY `passwordHash` varchar(72) NULL');
    await queryRunner.query(
      'CREATE TABLE `user_invitations` (' +
        '`id` uuid NOT NULL, ' +
        '`userId` uuid NOT NULL, ' +
        '`tokenHash` char(64) NOT NULL, ' +
        '`expiresAt` datetime(3) NOT NULL, ' +
        '`usedAt` datetime(3) NULL, ' +
        '`invitedBy` uuid NOT NULL, ' +
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        'UNIQUE INDEX `UQ_user_invitations_tokenHash` (`tokenHash`), ' +
        'INDEX `IDX_user_invitations_userId` (`userId`), ' +
        'PRIMARY KEY (`id`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
    await queryRunner.query(
      'ALTER TABLE `user_invitations` ADD CONSTRAINT `FK_user_invitations_user` ' +
        'FOREIGN KEY (`userId`) REFERENCES `users`(`id`) ON DELETE CASCADE ON UPDATE NO ACTION',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `user_invitations` DROP FOREIGN KEY `FK_user_invitations_user`');
    await queryRunner.query('DROP TABLE `user_invitations`');
    await queryRunner.query("UPDATE `users` SET `passwordHash` = '!' WHERE `passwordHash` IS NULL");
    await queryRunner.query('ALTER TABLE `users` MODIFY `passwordHash` varchar(72) NOT NULL');
  }
}
