import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateMemberships1796100003000 implements MigrationInterface {
  name = 'CreateMemberships1796100003000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`memberships\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`userId\` char(36) NOT NULL,
        \`role\` varchar(16) NOT NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`uq_memberships_shop_user\` (\`shopId\`, \`userId\`),
        KEY \`ix_memberships_user\` (\`userId\`),
        CONSTRAINT \`fk_memberships_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_memberships_user\` FOREIGN KEY (\`userId\`) REFERENCES \`users\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`ck_memberships_role\` CHECK (\`role\` IN ('owner', 'estimator', 'fabricator', 'counter', 'customer'))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `memberships`');
  }
}
