import { MigrationInterface, QueryRunner } from 'typeorm';

/** A parts plan names the stored fit report whose shortfalls it answers. */
export class PartsPlansFitReport1796252953356 implements MigrationInterface {
  name = 'PartsPlansFitReport1796252953356';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'ALTER TABLE `parts_plans` ADD CONSTRAINT `fk_parts_plans_fit_report` FOREIGN KEY (`fitReportId`) REFERENCES `fit_reports` (`id`) ON DELETE SET NULL',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `parts_plans` DROP FOREIGN KEY `fk_parts_plans_fit_report`');
  }
}
