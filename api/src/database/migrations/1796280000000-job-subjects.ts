import { MigrationInterface, QueryRunner } from 'typeorm';

/** What each background job is about, in words (e.g. "Quote Q-0003 e-mail to …"), kept after its payload is cleared. */
export class JobSubjects1796280000000 implements MigrationInterface {
  name = 'JobSubjects1796280000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `jobs` ADD `subject` varchar(300) NULL AFTER `shopId`');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `jobs` DROP COLUMN `subject`');
  }
}
