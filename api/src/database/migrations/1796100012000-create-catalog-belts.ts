import { MigrationInterface, QueryRunner } from 'typeorm';

/** Stock serpentine belts: the shared belt spec as JSON plus the rib count, indexed for the fit spec's belt candidates. */
export class CreateCatalogBelts1796100012000 implements MigrationInterface {
  name = 'CreateCatalogBelts1796100012000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`catalog_belts\` (
  \`id\` char(36) NOT NULL,
  \`shopId\` char(36) NOT NULL,
  \`name\` varchar(120) NOT NULL,
  \`spec\` longtext NOT NULL,
  \`ribs\` tinyint unsigned NOT NULL,
  \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
  \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
  PRIMARY KEY (\`id\`),
  KEY \`ix_catalog_belts_shop_name\` (\`shopId\`, \`name\`),
  KEY \`ix_catalog_belts_ribs\` (\`ribs\`),
  CONSTRAINT \`fk_catalog_belts_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
  CONSTRAINT \`ck_catalog_belts_spec\` CHECK (json_valid(\`spec\`))
) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `catalog_belts`');
  }
}
