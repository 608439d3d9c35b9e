import { MigrationInterface, QueryRunner } from 'typeorm';

/** Rate-limit counters in the database, so every API instance counts the same attempts. */
export class ThrottleCounters1796256137273 implements MigrationInterface {
  name = 'ThrottleCounters1796256137273';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE `throttle_counters` (' +
        '`id` char(64) NOT NULL, `hits` int unsigned NOT NULL, `expiresAt` datetime(3) NOT NULL, ' +
        'PRIMARY KEY (`id`), KEY `idx_throttle_counters_expires` (`expiresAt`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `throttle_counters`');
  }
}
