import { MigrationInterface, QueryRunner } from 'typeorm';

const OLD_TO_NEW: [string, string][] = [
  ['measuring', 'intake'],
  ['checking', 'fit-checked'],
  ['quoting', 'quote-sent'],
  ['building', 'in-the-bay'],
];

/** The job's stages from intake to done, each reached by an event (see PROJECT_STATUSES in shared). */
export class ProjectStages1796257248657 implements MigrationInterface {
  name = 'ProjectStages1796257248657';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `projects` DROP CONSTRAINT `ck_projects_status`');
    await queryRunner.query('ALTER TABLE `projects` MODIFY `status` varchar(20) NOT NULL DEFAULT \'intake\'');
    for (const [from, to] of OLD_TO_NEW) await queryRunner.query('UPDATE `projects` SET `status` = ? WHERE `status` = ?', [to, from]);
    await queryRunner.query(
      "ALTER TABLE `projects` ADD CONSTRAINT `ck_projects_status` CHECK (`status` IN ('intake', 'measured', 'fit-checked', 'parts-planned', 'quote-sent', 'approved', 'deposit-paid', 'in-the-bay', 'done'))",
    );
    await queryRunner.query('CREATE INDEX `ix_projects_shop_status` ON `projects` (`shopId`, `status`)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP INDEX `ix_projects_shop_status` ON `projects`');
    await queryRunner.query('ALTER TABLE `projects` DROP CONSTRAINT `ck_projects_status`');
    await queryRunner.query("UPDATE `projects` SET `status` = 'intake' WHERE `status` = 'measured'");
    await queryRunner.query("UPDATE `projects` SET `status` = 'quote-sent' WHERE `status` = 'parts-planned'");
    await queryRunner.query("UPDATE `projects` SET `status` = 'approved' WHERE `status` = 'deposit-paid'");
    for (const [to, from] of OLD_TO_NEW.slice(1)) await queryRunner.query('UPDATE `projects` SET `status` = ? WHERE `status` = ?', [to, from]);
    await queryRunner.query('ALTER TABLE `projects` MODIFY `status` varchar(16) NOT NULL DEFAULT \'intake\'');
    await queryRunner.query(
      "ALTER TABLE `projects` ADD CONSTRAINT `ck_projects_status` CHECK (`status` IN ('intake', 'measuring', 'checking', 'quoting', 'approved', 'building', 'done'))",
    );
  }
}
