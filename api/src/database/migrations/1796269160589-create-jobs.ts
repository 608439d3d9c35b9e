import { MigrationInterface, QueryRunner } from 'typeorm';

/** The durable queue of background work (mail, quote PDFs by mail, payment events), claimed with FOR UPDATE SKIP LOCKED. */
export class CreateJobs1796269160589 implements MigrationInterface {
  name = 'CreateJobs1796269160589';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'CREATE TABLE `jobs` (' +
        '`id` char(36) NOT NULL, `kind` varchar(40) NOT NULL, `idempotencyKey` varchar(160) NOT NULL, `shopId` char(36) NULL, ' +
        '`state` varchar(10) NOT NULL, `payload` json NULL, `attempts` int unsigned NOT NULL DEFAULT 0, `maxAttempts` int unsigned NOT NULL, ' +
        '`runAt` datetime(3) NOT NULL, `leaseUntil` datetime(3) NULL, `lockedBy` varchar(80) NULL, `lastError` varchar(1000) NULL, ' +
        '`result` varchar(300) NULL, `createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), `doneAt` datetime(3) NULL, ' +
        'PRIMARY KEY (`id`), UNIQUE KEY `ux_jobs_kind_key` (`kind`, `idempotencyKey`), KEY `idx_jobs_state_run_at` (`state`, `runAt`), ' +
        'KEY `idx_jobs_shop_created` (`shopId`, `createdAt`)' +
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `jobs`');
  }
}
