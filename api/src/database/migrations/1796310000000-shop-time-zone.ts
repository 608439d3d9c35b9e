import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The shop's IANA time zone, whose calendar day dates its quotes (issued, valid until, lapsed). Existing shops keep the
 * UTC day they had; a sign-up waiting for its link keeps the zone the browser sent until the shop is created.
 */
export class ShopTimeZone1796310000000 implements MigrationInterface {
  name = 'ShopTimeZone1796310000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query("ALTER TABLE `shops` ADD `timeZone` varchar(64) NOT NULL DEFAULT 'UTC' AFTER `currency`");
    await queryRunner.query("ALTER TABLE `pending_sign_ups` ADD `timeZone` varchar(64) NOT NULL DEFAULT 'UTC' AFTER `shopName`");
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE `pending_sign_ups` DROP COLUMN `timeZone`');
    await queryRunner.query('ALTER TABLE `shops` DROP COLUMN `timeZone`');
  }
}
