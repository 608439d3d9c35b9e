import { MigrationInterface, QueryRunner } from 'typeorm';

interface CatalogTable {
  name: string;
  /** Extra column definitions and their keys, after the common ones. */
  columns: string[];
  keys: string[];
}

const TABLES: CatalogTable[] = [
  {
    name: 'catalog_engines',
    columns: ['`bellPattern` varchar(40) NOT NULL', '`railPattern` varchar(40) NOT NULL'],
    keys: ['KEY `ix_catalog_engines_bell` (`bellPattern`)', 'KEY `ix_catalog_engines_rail` (`railPattern`)'],
  },
  {
    name: 'catalog_oil_pans',
    columns: ['`railPattern` varchar(40) NOT NULL', '`sumpPosition` varchar(8) NOT NULL', '`pickupMount` varchar(16) NOT NULL'],
    keys: ['KEY `ix_catalog_oil_pans_rail` (`railPattern`)', 'KEY `ix_catalog_oil_pans_sump` (`sumpPosition`)'],
  },
  {
    name: 'catalog_oil_pickups',
    columns: ['`sumpPosition` varchar(8) NOT NULL', '`pickupMount` varchar(16) NOT NULL', '`pumpInlet` varchar(40) NOT NULL'],
    keys: ['KEY `ix_catalog_oil_pickups_sump` (`sumpPosition`)', 'KEY `ix_catalog_oil_pickups_inlet` (`pumpInlet`)'],
  },
  {
    name: 'catalog_oil_pumps',
    columns: ['`pumpInlet` varchar(40) NOT NULL'],
    keys: ['KEY `ix_catalog_oil_pumps_inlet` (`pumpInlet`)'],
  },
  {
    name: 'catalog_transmissions',
    columns: ['`bellPattern` varchar(40) NOT NULL'],
    keys: ['KEY `ix_catalog_transmissions_bell` (`bellPattern`)'],
  },
  {
    name: 'catalog_chassis',
    columns: ['`defaultSetbackMm` decimal(8,2) NULL', '`defaultHeightMm` decimal(8,2) NULL', '`defaultTiltDeg` decimal(6,2) NULL'],
    keys: [],
  },
  { name: 'catalog_controllers', columns: [], keys: [] },
  { name: 'catalog_mount_adapters', columns: [], keys: [] },
  {
    name: 'catalog_bellhousing_adapters',
    columns: ['`enginePattern` varchar(40) NOT NULL', '`transmissionPattern` varchar(40) NOT NULL'],
    keys: [
      'KEY `ix_catalog_bellhousing_adapters_engine` (`enginePattern`)',
      'KEY `ix_catalog_bellhousing_adapters_transmission` (`transmissionPattern`)',
    ],
  },
];

/** The shop's catalog: one table per part kind, the shared part spec as JSON plus indexed filter columns. */
export class CreateCatalog1796100010000 implements MigrationInterface {
  name = 'CreateCatalog1796100010000';

  async up(queryRunner: QueryRunner): Promise<void> {
    for (const table of TABLES) {
      const lines = [
        '`id` char(36) NOT NULL',
        '`shopId` char(36) NOT NULL',
        '`name` varchar(120) NOT NULL',
        '`spec` longtext NOT NULL',
        ...table.columns,
        '`createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)',
        '`updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)',
        'PRIMARY KEY (`id`)',
        `KEY \`ix_${table.name}_shop_name\` (\`shopId\`, \`name\`)`,
        ...table.keys,
        `CONSTRAINT \`fk_${table.name}_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE`,
        `CONSTRAINT \`ck_${table.name}_spec\` CHECK (json_valid(\`spec\`))`,
      ];
      await queryRunner.query(
        `CREATE TABLE \`${table.name}\` (\n  ${lines.join(',\n  ')}\n) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`,
      );
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of [...TABLES].reverse()) await queryRunner.query(`DROP TABLE \`${table.name}\``);
  }
}
