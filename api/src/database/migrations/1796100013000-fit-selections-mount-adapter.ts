import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The mount adapter a project's fit selection uses on both engine mounts. Like the other chosen parts it
 * cannot be deleted from the catalog while selected (RESTRICT): the API answers 409 still_referenced.
 */
export class FitSelectionsMountAdapter1796100013000 implements MigrationInterface {
  name = 'FitSelectionsMountAdapter1796100013000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'ALTER TABLE `project_fit_selections` ADD COLUMN `mountAdapterId` char(36) NULL AFTER `accessoryDriveId`, ' +
        'ADD CONSTRAINT `fk_fit_selections_mount_adapter` FOREIGN KEY (`mountAdapterId`) REFERENCES `catalog_mount_adapters` (`id`) ON DELETE RESTRICT',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `project_fit_selections` DROP FOREIGN KEY `fk_fit_selections_mount_adapter`');
    await queryRunner.query('ALTER TABLE `project_fit_selections` DROP COLUMN `mountAdapterId`');
  }
}
