import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateAuthTokens1796100004000 implements MigrationInterface {
  name = 'CreateAuthTokens1796100004000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`refresh_tokens\` (
        \`id\` char(36) NOT NULL,
        \`userId\` char(36) NOT NULL,
        \`membershipId\` char(36) NOT NULL,
        \`tokenHash\` char(64) NOT NULL,
        \`expiresAt\` datetime(3) NOT NULL,
        \`revokedAt\` datetime(3) NULL,
        \`replacedById\` char(36) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`uq_refresh_tokens_token_hash\` (\`tokenHash\`),
        KEY \`ix_refresh_tokens_user\` (\`userId\`),
        CONSTRAINT \`fk_refresh_tokens_user\` FOREIGN KEY (\`userId\`) REFERENCES \`users\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_refresh_tokens_membership\` FOREIGN KEY (\`membershipId\`) REFERENCES \`memberships\` (\`id\`) ON DELETE CASCADE
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`password_reset_tokens\` (
        \`id\` char(36) NOT NULL,
        \`userId\` char(36) NOT NULL,
        \`tokenHash\` char(64) NOT NULL,
        \`expiresAt\` datetime(3) NOT NULL,
        \`usedAt\` datetime(3) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`uq_password_reset_tokens_token_hash\` (\`tokenHash\`),
        KEY \`ix_password_reset_tokens_user\` (\`userId\`),
        CONSTRAINT \`fk_password_reset_tokens_user\` FOREIGN KEY (\`userId\`) REFERENCES \`users\` (\`id\`) ON DELETE CASCADE
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `password_reset_tokens`');
    await queryRunner.query('DROP TABLE `refresh_tokens`');
  }
}
