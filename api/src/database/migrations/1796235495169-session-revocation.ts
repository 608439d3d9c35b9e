import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Access tokens that can be ended before they expire. `users.sessionVersion` is carried in every access token
 * and bumped when the password is reset, which ends every session of that person at once. `refresh_tokens.sessionId`
 * names the sign-in a token belongs to (kept across refreshes); access tokens carry it too, so signing out ends
 * that one session's access tokens with its refresh token.
 */
export class SessionRevocation1796235495169 implements MigrationInterface {
  name = 'SessionRevocation1796235495169';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `users` ADD COLUMN `sessionVersion` int unsigned NOT NULL DEFAULT 0 AFTER `passwordHash`');
    await queryRunner.query('ALTER TABLE `refresh_tokens` ADD COLUMN `sessionId` char(36) NULL AFTER `membershipId`');
    // Each existing token starts a session of its own.
    await queryRunner.query('UPDATE `refresh_tokens` SET `sessionId` = `id`');
    await queryRunner.query(
      'ALTER TABLE `refresh_tokens` MODIFY `sessionId` char(36) NOT NULL, ADD KEY `ix_refresh_tokens_session` (`sessionId`, `revokedAt`)',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `refresh_tokens` DROP KEY `ix_refresh_tokens_session`, DROP COLUMN `sessionId`');
    await queryRunner.query('ALTER TABLE `users` DROP COLUMN `sessionVersion`');
  }
}
