import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Each reading's version: 1 for the first reading of a point, one more on every change. A save states the version
 * it was typed over, so a second tab or a second phone cannot replace a reading it never saw.
 */
export class MeasurementValueVersions1796300000000 implements MigrationInterface {
  name = 'MeasurementValueVersions1796300000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `measurement_values` ADD `version` int NOT NULL DEFAULT 1');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `measurement_values` DROP COLUMN `version`');
  }
}
