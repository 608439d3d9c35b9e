import { MigrationInterface, QueryRunner } from 'typeorm';

/** Optional photos of work-order checks (the files live in the shared photo storage; rows name their generated keys). */
export class WorkOrderCheckPhotos1796270000000 implements MigrationInterface {
  name = 'WorkOrderCheckPhotos1796270000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`work_order_check_photos\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`workOrderId\` char(36) NOT NULL,
        \`projectId\` char(36) NOT NULL,
        \`checkKey\` varchar(130) NOT NULL,
        \`storageKey\` varchar(64) NOT NULL,
        \`contentType\` varchar(20) NOT NULL,
        \`bytes\` int NOT NULL,
        \`widthPx\` int NOT NULL,
        \`heightPx\` int NOT NULL,
        \`uploadedById\` char(36) NOT NULL,
        \`uploadedByName\` varchar(120) NOT NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`ux_work_order_check_photos_storage\` (\`storageKey\`),
        KEY \`ix_work_order_check_photos_order\` (\`workOrderId\`, \`checkKey\`, \`createdAt\`),
        KEY \`ix_work_order_check_photos_shop\` (\`shopId\`),
        CONSTRAINT \`fk_work_order_check_photos_order\` FOREIGN KEY (\`workOrderId\`) REFERENCES \`work_orders\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_work_order_check_photos_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `work_order_check_photos`');
  }
}
