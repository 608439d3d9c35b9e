import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateCustomers1796100002000 implements MigrationInterface {
  name = 'CreateCustomers1796100002000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`customers\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`name\` varchar(120) NOT NULL,
        \`email\` varchar(254) NULL,
        \`phone\` varchar(40) NULL,
        \`notes\` text NULL,
        \`userId\` char(36) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        KEY \`ix_customers_shop_name\` (\`shopId\`, \`name\`),
        UNIQUE KEY \`uq_customers_shop_user\` (\`shopId\`, \`userId\`),
        CONSTRAINT \`fk_customers_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_customers_user\` FOREIGN KEY (\`userId\`) REFERENCES \`users\` (\`id\`) ON DELETE SET NULL
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `customers`');
  }
}
