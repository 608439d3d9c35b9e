import { MigrationInterface, QueryRunner } from 'typeorm';

/** Work orders (one per approved quote, opened when its deposit settles) and the checks the bay records on them. */
export class CreateWorkOrders1796257248658 implements MigrationInterface {
  name = 'CreateWorkOrders1796257248658';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`work_orders\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`projectId\` char(36) NOT NULL,
        \`quoteId\` char(36) NOT NULL,
        \`quoteRevision\` int NOT NULL,
        \`number\` int NOT NULL,
        \`state\` varchar(12) NOT NULL DEFAULT 'ready',
        \`steps\` json NOT NULL,
        \`fitReportId\` char(36) NULL,
        \`partsPlanVersion\` int NULL,
        \`startedAt\` datetime(3) NULL,
        \`startedById\` char(36) NULL,
        \`finishedAt\` datetime(3) NULL,
        \`finishedById\` char(36) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`ux_work_orders_quote\` (\`quoteId\`),
        KEY \`ix_work_orders_shop_state\` (\`shopId\`, \`state\`, \`createdAt\`),
        KEY \`ix_work_orders_project\` (\`projectId\`),
        CONSTRAINT \`fk_work_orders_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_work_orders_project\` FOREIGN KEY (\`projectId\`) REFERENCES \`projects\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_work_orders_quote\` FOREIGN KEY (\`quoteId\`) REFERENCES \`quotes\` (\`id\`) ON DELETE RESTRICT,
        CONSTRAINT \`ck_work_orders_state\` CHECK (\`state\` IN ('ready', 'in-the-bay', 'finished'))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`work_order_checks\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`workOrderId\` char(36) NOT NULL,
        \`checkKey\` varchar(130) NOT NULL,
        \`result\` varchar(4) NOT NULL,
        \`value\` decimal(10,2) NULL,
        \`note\` varchar(500) NOT NULL DEFAULT '',
        \`recordedById\` char(36) NOT NULL,
        \`recordedByName\` varchar(120) NOT NULL,
        \`recordedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        KEY \`ix_work_order_checks_order\` (\`workOrderId\`, \`checkKey\`, \`recordedAt\`),
        CONSTRAINT \`fk_work_order_checks_order\` FOREIGN KEY (\`workOrderId\`) REFERENCES \`work_orders\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`ck_work_order_checks_result\` CHECK (\`result\` IN ('pass', 'fail'))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `work_order_checks`');
    await queryRunner.query('DROP TABLE `work_orders`');
  }
}
