import { MigrationInterface, QueryRunner } from 'typeorm';

/** The shop's audit log: who changed money, stock, a sheet's sign-off or a membership, when, from what to what. */
export class CreateAuditEvents1796257768745 implements MigrationInterface {
  name = 'CreateAuditEvents1796257768745';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`audit_events\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`actorUserId\` char(36) NULL,
        \`actorName\` varchar(160) NOT NULL,
        \`kind\` varchar(20) NOT NULL,
        \`action\` varchar(60) NOT NULL,
        \`subjectId\` char(36) NULL,
        \`summary\` varchar(300) NOT NULL,
        \`before\` json NULL,
        \`after\` json NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        KEY \`ix_audit_events_shop_time\` (\`shopId\`, \`createdAt\`),
        KEY \`ix_audit_events_shop_kind_time\` (\`shopId\`, \`kind\`, \`createdAt\`),
        CONSTRAINT \`fk_audit_events_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci
    `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `audit_events`');
  }
}
