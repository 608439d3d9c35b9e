import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateProjects1796100005000 implements MigrationInterface {
  name = 'CreateProjects1796100005000';

  // fk_projects_customer is RESTRICT: a customer with projects cannot be deleted (the service says so first).
  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`projects\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`customerId\` char(36) NOT NULL,
        \`title\` varchar(160) NOT NULL,
        \`status\` varchar(16) NOT NULL DEFAULT 'intake',
        \`vehicleDescription\` varchar(500) NOT NULL DEFAULT '',
        \`chassisModelId\` varchar(36) NULL,
        \`engineProfileId\` varchar(36) NULL,
        \`transmissionId\` varchar(36) NULL,
        \`goalUse\` varchar(16) NOT NULL DEFAULT 'street',
        \`goalTargetPowerKw\` decimal(6,1) NULL,
        \`goalRevLimitRpm\` int NULL,
        \`goalBudgetCents\` bigint NULL,
        \`placementSetbackMm\` decimal(8,2) NULL,
        \`placementHeightMm\` decimal(8,2) NULL,
        \`placementTiltDeg\` decimal(6,2) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        KEY \`ix_projects_shop_updated\` (\`shopId\`, \`updatedAt\`),
        KEY \`ix_projects_customer\` (\`customerId\`),
        CONSTRAINT \`fk_projects_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_projects_customer\` FOREIGN KEY (\`customerId\`) REFERENCES \`customers\` (\`id\`) ON DELETE RESTRICT,
        CONSTRAINT \`ck_projects_status\` CHECK (\`status\` IN ('intake', 'measuring', 'checking', 'quoting', 'approved', 'building', 'done')),
        CONSTRAINT \`ck_projects_goal_use\` CHECK (\`goalUse\` IN ('street', 'tow', 'off-road', 'strip'))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `projects`');
  }
}
