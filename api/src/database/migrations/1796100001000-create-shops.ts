import { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateShops1796100001000 implements MigrationInterface {
  name = 'CreateShops1796100001000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`shops\` (
        \`id\` char(36) NOT NULL,
        \`name\` varchar(120) NOT NULL,
        \`unitSystem\` varchar(2) NOT NULL DEFAULT 'in',
        \`laborRatePerHour\` decimal(10,2) NOT NULL DEFAULT 0,
        \`taxRatePercent\` decimal(5,2) NOT NULL DEFAULT 0,
        \`shopSuppliesPercent\` decimal(5,2) NOT NULL DEFAULT 0,
        \`currency\` char(3) NOT NULL DEFAULT 'USD',
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        CONSTRAINT \`ck_shops_unit_system\` CHECK (\`unitSystem\` IN ('in', 'mm'))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `shops`');
  }
}
