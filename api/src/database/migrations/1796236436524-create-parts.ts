import { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE_END = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

/**
 * The shop's parts catalog beside the fit specs: suppliers, parts (SKU unique per shop, money in cents, an
 * optional link to a fit spec row), stock per location and bin, stored parts plans with versions, and the
 * counter's lines (reservations and orders) per plan.
 */
export class CreateParts1796236436524 implements MigrationInterface {
  name = 'CreateParts1796236436524';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE \`suppliers\` (
  \`id\` char(36) NOT NULL,
  \`shopId\` char(36) NOT NULL,
  \`name\` varchar(120) NOT NULL,
  \`contact\` varchar(120) NULL,
  \`email\` varchar(254) NULL,
  \`phone\` varchar(40) NULL,
  \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
  \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
  PRIMARY KEY (\`id\`),
  UNIQUE KEY \`uq_suppliers_shop_name\` (\`shopId\`, \`name\`),
  CONSTRAINT \`fk_suppliers_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE
) ${TABLE_END}`);
    await queryRunner.query(`CREATE TABLE \`parts\` (
  \`id\` char(36) NOT NULL,
  \`shopId\` char(36) NOT NULL,
  \`sku\` varchar(64) NOT NULL,
  \`description\` varchar(240) NOT NULL,
  \`category\` varchar(40) NOT NULL,
  \`priceCents\` int unsigned NOT NULL,
  \`costCents\` int unsigned NOT NULL DEFAULT 0,
  \`supplierId\` char(36) NULL,
  \`supplierSku\` varchar(64) NULL,
  \`laborHours\` decimal(6,1) NOT NULL DEFAULT 0,
  \`torqueSpecs\` longtext NOT NULL,
  \`instructions\` text NULL,
  \`attributes\` longtext NOT NULL,
  \`requiresSkus\` longtext NOT NULL,
  \`excludesSkus\` longtext NOT NULL,
  \`replacesSkus\` longtext NOT NULL,
  \`fitKind\` varchar(40) NULL,
  \`fitSpecId\` char(36) NULL,
  \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
  \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
  PRIMARY KEY (\`id\`),
  UNIQUE KEY \`uq_parts_shop_sku\` (\`shopId\`, \`sku\`),
  KEY \`ix_parts_shop_category\` (\`shopId\`, \`category\`),
  KEY \`ix_parts_shop_description\` (\`shopId\`, \`description\`),
  KEY \`ix_parts_fit_spec\` (\`fitSpecId\`),
  CONSTRAINT \`fk_parts_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
  CONSTRAINT \`fk_parts_supplier\` FOREIGN KEY (\`supplierId\`) REFERENCES \`suppliers\` (\`id\`) ON DELETE SET NULL,
  CONSTRAINT \`ck_parts_json\` CHECK (json_valid(\`attributes\`) AND json_valid(\`torqueSpecs\`) AND json_valid(\`requiresSkus\`) AND json_valid(\`excludesSkus\`) AND json_valid(\`replacesSkus\`))
) ${TABLE_END}`);
    await queryRunner.query(`CREATE TABLE \`part_stock\` (
  \`id\` char(36) NOT NULL,
  \`shopId\` char(36) NOT NULL,
  \`partId\` char(36) NOT NULL,
  \`location\` varchar(60) NOT NULL,
  \`bin\` varchar(40) NOT NULL DEFAULT '',
  \`onHand\` int unsigned NOT NULL DEFAULT 0,
  \`reserved\` int unsigned NOT NULL DEFAULT 0,
  \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
  PRIMARY KEY (\`id\`),
  UNIQUE KEY \`uq_part_stock_location\` (\`partId\`, \`location\`),
  KEY \`ix_part_stock_shop\` (\`shopId\`),
  CONSTRAINT \`fk_part_stock_part\` FOREIGN KEY (\`partId\`) REFERENCES \`parts\` (\`id\`) ON DELETE CASCADE,
  CONSTRAINT \`ck_part_stock_reserved\` CHECK (\`reserved\` <= \`onHand\`)
) ${TABLE_END}`);
    await queryRunner.query(`CREATE TABLE \`parts_plans\` (
  \`id\` char(36) NOT NULL,
  \`shopId\` char(36) NOT NULL,
  \`projectId\` char(36) NOT NULL,
  \`version\` int unsigned NOT NULL,
  \`objective\` varchar(24) NOT NULL,
  \`status\` varchar(12) NOT NULL,
  \`fitReportId\` char(36) NULL,
  \`result\` longtext NOT NULL,
  \`recheck\` longtext NOT NULL,
  \`totalCents\` int unsigned NOT NULL,
  \`solveMs\` int unsigned NOT NULL,
  \`lockedAt\` datetime(3) NULL,
  \`createdById\` char(36) NULL,
  \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
  PRIMARY KEY (\`id\`),
  UNIQUE KEY \`uq_parts_plans_version\` (\`projectId\`, \`version\`),
  KEY \`ix_parts_plans_shop\` (\`shopId\`, \`createdAt\`),
  CONSTRAINT \`fk_parts_plans_project\` FOREIGN KEY (\`projectId\`) REFERENCES \`projects\` (\`id\`) ON DELETE CASCADE,
  CONSTRAINT \`ck_parts_plans_json\` CHECK (json_valid(\`result\`) AND json_valid(\`recheck\`))
) ${TABLE_END}`);
    await queryRunner.query(`CREATE TABLE \`counter_lines\` (
  \`id\` char(36) NOT NULL,
  \`shopId\` char(36) NOT NULL,
  \`planId\` char(36) NOT NULL,
  \`projectId\` char(36) NOT NULL,
  \`partId\` char(36) NULL,
  \`sku\` varchar(64) NOT NULL,
  \`description\` varchar(240) NOT NULL,
  \`quantity\` int unsigned NOT NULL,
  \`status\` varchar(16) NOT NULL,
  \`stockId\` char(36) NULL,
  \`updatedById\` char(36) NULL,
  \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
  PRIMARY KEY (\`id\`),
  KEY \`ix_counter_lines_plan\` (\`planId\`),
  KEY \`ix_counter_lines_shop_status\` (\`shopId\`, \`status\`),
  CONSTRAINT \`fk_counter_lines_plan\` FOREIGN KEY (\`planId\`) REFERENCES \`parts_plans\` (\`id\`) ON DELETE CASCADE,
  CONSTRAINT \`fk_counter_lines_part\` FOREIGN KEY (\`partId\`) REFERENCES \`parts\` (\`id\`) ON DELETE SET NULL,
  CONSTRAINT \`fk_counter_lines_stock\` FOREIGN KEY (\`stockId\`) REFERENCES \`part_stock\` (\`id\`) ON DELETE SET NULL
) ${TABLE_END}`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['counter_lines', 'parts_plans', 'part_stock', 'parts', 'suppliers']) await queryRunner.query(`DROP TABLE \`${table}\``);
  }
}
