import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * When a counter line's parts were issued to the job (taken off the shelf), and an index by project and state: finishing
 * a work order locks that project's set-aside lines and no others.
 */
export class CounterLinesIssued1796290000000 implements MigrationInterface {
  name = 'CounterLinesIssued1796290000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `counter_lines` ADD `issuedAt` datetime(3) NULL AFTER `stockId`');
    await queryRunner.query('ALTER TABLE `counter_lines` ADD KEY `ix_counter_lines_project_status` (`projectId`, `status`)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `counter_lines` DROP KEY `ix_counter_lines_project_status`');
    await queryRunner.query('ALTER TABLE `counter_lines` DROP COLUMN `issuedAt`');
  }
}
