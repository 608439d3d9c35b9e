import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateInvitations1796100003500 implements MigrationInterface {
  name = 'CreateInvitations1796100003500';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`invitations\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`email\` varchar(254) NOT NULL,
        \`role\` varchar(16) NOT NULL,
        \`customerId\` char(36) NULL,
        \`tokenHash\` char(64) NOT NULL,
        \`expiresAt\` datetime(3) NOT NULL,
        \`acceptedAt\` datetime(3) NULL,
        \`invitedByUserId\` char(36) NOT NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`uq_invitations_token_hash\` (\`tokenHash\`),
        KEY \`ix_invitations_shop_email\` (\`shopId\`, \`email\`),
        CONSTRAINT \`fk_invitations_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_invitations_customer\` FOREIGN KEY (\`customerId\`) REFERENCES \`customers\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_invitations_invited_by\` FOREIGN KEY (\`invitedByUserId\`) REFERENCES \`users\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`ck_invitations_role\` CHECK (\`role\` IN ('owner', 'estimator', 'fabricator', 'counter', 'customer'))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `invitations`');
  }
}
