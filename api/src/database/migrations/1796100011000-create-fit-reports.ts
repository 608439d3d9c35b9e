import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Fit selections (one row per project), the shop's fit thresholds, and stored fit reports.
 * A catalog part chosen in a selection cannot be deleted (RESTRICT): the API answers 409 still_referenced.
 * A stored report outlives its author: createdById is cleared if that user is ever removed.
 */
export class CreateFitReports1796100011000 implements MigrationInterface {
  name = 'CreateFitReports1796100011000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`project_fit_selections\` (
        \`projectId\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`oilPanId\` char(36) NULL,
        \`oilPickupId\` char(36) NULL,
        \`oilPumpId\` char(36) NULL,
        \`controllerId\` char(36) NULL,
        \`accessoryDriveId\` varchar(40) NULL,
        \`driveshaftOuterDiameterMm\` decimal(6,2) NULL,
        \`driveshaftWallMm\` decimal(6,3) NULL,
        \`driveshaftMaterial\` varchar(16) NULL,
        \`driveshaftLengthMm\` decimal(7,1) NULL,
        \`driveshaftSuspensionGrowthMm\` decimal(5,1) NULL,
        \`timingSetAdvanceDeg\` decimal(5,2) NULL,
        \`topSpeedKph\` decimal(6,1) NULL,
        \`tireDiameterMm\` decimal(6,1) NULL,
        \`axleRatio\` decimal(5,3) NULL,
        \`continuousPowerKw\` decimal(7,1) NULL,
        \`updatedById\` char(36) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`projectId\`),
        KEY \`ix_project_fit_selections_shop\` (\`shopId\`),
        CONSTRAINT \`fk_fit_selections_project\` FOREIGN KEY (\`projectId\`) REFERENCES \`projects\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_fit_selections_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_fit_selections_pan\` FOREIGN KEY (\`oilPanId\`) REFERENCES \`catalog_oil_pans\` (\`id\`) ON DELETE RESTRICT,
        CONSTRAINT \`fk_fit_selections_pickup\` FOREIGN KEY (\`oilPickupId\`) REFERENCES \`catalog_oil_pickups\` (\`id\`) ON DELETE RESTRICT,
        CONSTRAINT \`fk_fit_selections_pump\` FOREIGN KEY (\`oilPumpId\`) REFERENCES \`catalog_oil_pumps\` (\`id\`) ON DELETE RESTRICT,
        CONSTRAINT \`fk_fit_selections_controller\` FOREIGN KEY (\`controllerId\`) REFERENCES \`catalog_controllers\` (\`id\`) ON DELETE RESTRICT,
        CONSTRAINT \`ck_fit_selections_material\` CHECK (\`driveshaftMaterial\` IS NULL OR \`driveshaftMaterial\` IN ('steel', 'aluminum'))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`shop_fit_settings\` (
        \`shopId\` char(36) NOT NULL,
        \`overrides\` longtext NOT NULL,
        \`updatedById\` char(36) NULL,
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`shopId\`),
        CONSTRAINT \`fk_shop_fit_settings_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`ck_shop_fit_settings_overrides\` CHECK (json_valid(\`overrides\`))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`fit_reports\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`projectId\` char(36) NOT NULL,
        \`createdById\` char(36) NULL,
        \`engineVersion\` varchar(20) NOT NULL,
        \`placementSetbackMm\` decimal(8,2) NOT NULL,
        \`placementHeightMm\` decimal(8,2) NOT NULL,
        \`placementTiltDeg\` decimal(6,2) NOT NULL,
        \`placementSource\` varchar(16) NOT NULL,
        \`inputsSnapshot\` longtext NOT NULL,
        \`results\` longtext NOT NULL,
        \`totalCount\` int NOT NULL,
        \`okCount\` int NOT NULL,
        \`tightCount\` int NOT NULL,
        \`failsCount\` int NOT NULL,
        \`unknownCount\` int NOT NULL,
        \`worstStatus\` varchar(8) NOT NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        KEY \`ix_fit_reports_project_created\` (\`shopId\`, \`projectId\`, \`createdAt\`),
        KEY \`ix_fit_reports_project\` (\`projectId\`),
        CONSTRAINT \`fk_fit_reports_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_fit_reports_project\` FOREIGN KEY (\`projectId\`) REFERENCES \`projects\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_fit_reports_user\` FOREIGN KEY (\`createdById\`) REFERENCES \`users\` (\`id\`) ON DELETE SET NULL,
        CONSTRAINT \`ck_fit_reports_placement_source\` CHECK (\`placementSource\` IN ('project', 'proposed', 'chassis-default')),
        CONSTRAINT \`ck_fit_reports_worst\` CHECK (\`worstStatus\` IN ('ok', 'tight', 'fails', 'unknown')),
        CONSTRAINT \`ck_fit_reports_inputs\` CHECK (json_valid(\`inputsSnapshot\`)),
        CONSTRAINT \`ck_fit_reports_results\` CHECK (json_valid(\`results\`))
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `fit_reports`');
    await queryRunner.query('DROP TABLE `shop_fit_settings`');
    await queryRunner.query('DROP TABLE `project_fit_selections`');
  }
}
