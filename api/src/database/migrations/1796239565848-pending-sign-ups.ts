import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A sign-up waits here until its e-mail link is opened, so the sign-up answer is the same whether or not the
 * address already has an account. The password is stored hashed; a link works once, for a limited time.
 */
export class PendingSignUps1796239565848 implements MigrationInterface {
  name = 'PendingSignUps1796239565848';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`pending_sign_ups\` (
        \`id\` char(36) NOT NULL,
        \`email\` varchar(254) NOT NULL,
        \`name\` varchar(120) NOT NULL,
        \`shopName\` varchar(120) NOT NULL,
        \`passwordHash\` varchar(100) NOT NULL,
        \`tokenHash\` char(64) NOT NULL,
        \`expiresAt\` datetime(3) NOT NULL,
        \`usedAt\` datetime(3) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`uq_pending_sign_ups_token_hash\` (\`tokenHash\`),
        KEY \`ix_pending_sign_ups_email\` (\`email\`)
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `pending_sign_ups`');
  }
}
