import { MigrationInterface, QueryRunner } from 'typeorm';

/** Measurement templates per chassis model, sheets per project with values, their history, photos, and the shop's deviation limit. */
export class CreateMeasurements1796240364406 implements MigrationInterface {
  name = 'CreateMeasurements1796240364406';

  async up(q: QueryRunner): Promise<void> {
    const tail = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';
    await q.query(
      'CREATE TABLE `measurement_templates` (`id` char(36) NOT NULL, `shopId` char(36) NOT NULL, `chassisId` char(36) NOT NULL, ' +
        '`points` json NOT NULL, `updatedById` char(36) NULL, `updatedAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), ' +
        'PRIMARY KEY (`id`), UNIQUE KEY `uq_measurement_templates_chassis` (`shopId`, `chassisId`), ' +
        'CONSTRAINT `fk_measurement_templates_shop` FOREIGN KEY (`shopId`) REFERENCES `shops` (`id`) ON DELETE CASCADE) ' + tail,
    );
    await q.query(
      'CREATE TABLE `measurement_sheets` (`id` char(36) NOT NULL, `shopId` char(36) NOT NULL, `projectId` char(36) NOT NULL, ' +
        '`signedOffAt` datetime(3) NULL, `signedOffById` char(36) NULL, `createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), ' +
        'PRIMARY KEY (`id`), UNIQUE KEY `uq_measurement_sheets_project` (`shopId`, `projectId`), ' +
        'CONSTRAINT `fk_measurement_sheets_project` FOREIGN KEY (`projectId`) REFERENCES `projects` (`id`) ON DELETE CASCADE) ' + tail,
    );
    await q.query(
      'CREATE TABLE `measurement_values` (`id` char(36) NOT NULL, `shopId` char(36) NOT NULL, `sheetId` char(36) NOT NULL, `pointId` varchar(80) NOT NULL, ' +
        '`value` decimal(10,2) NOT NULL, `tolerance` decimal(8,2) NULL, `note` varchar(500) NULL, `measuredById` char(36) NOT NULL, ' +
        '`measuredByName` varchar(120) NOT NULL, `measuredAt` datetime(3) NOT NULL, PRIMARY KEY (`id`), ' +
        'UNIQUE KEY `uq_measurement_values_point` (`sheetId`, `pointId`), ' +
        'CONSTRAINT `fk_measurement_values_sheet` FOREIGN KEY (`sheetId`) REFERENCES `measurement_sheets` (`id`) ON DELETE CASCADE) ' + tail,
    );
    await q.query(
      'CREATE TABLE `measurement_sheet_events` (`id` char(36) NOT NULL, `shopId` char(36) NOT NULL, `sheetId` char(36) NOT NULL, `kind` varchar(16) NOT NULL, ' +
        '`pointId` varchar(80) NULL, `oldValue` decimal(10,2) NULL, `newValue` decimal(10,2) NULL, `reason` varchar(500) NULL, ' +
        '`byId` char(36) NOT NULL, `byName` varchar(120) NOT NULL, `at` datetime(3) NOT NULL, PRIMARY KEY (`id`), ' +
        'KEY `ix_measurement_sheet_events_sheet` (`sheetId`, `at`), ' +
        'CONSTRAINT `fk_measurement_sheet_events_sheet` FOREIGN KEY (`sheetId`) REFERENCES `measurement_sheets` (`id`) ON DELETE CASCADE) ' + tail,
    );
    await q.query(
      'CREATE TABLE `measurement_photos` (`id` char(36) NOT NULL, `shopId` char(36) NOT NULL, `sheetId` char(36) NOT NULL, `projectId` char(36) NOT NULL, ' +
        '`pointId` varchar(80) NULL, `storageKey` varchar(80) NOT NULL, `contentType` varchar(20) NOT NULL, `bytes` int NOT NULL, ' +
        '`widthPx` int NOT NULL, `heightPx` int NOT NULL, `status` varchar(16) NOT NULL, `uploadedById` char(36) NOT NULL, ' +
        '`uploadedByName` varchar(120) NOT NULL, `createdAt` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), PRIMARY KEY (`id`), ' +
        'KEY `ix_measurement_photos_sheet` (`sheetId`, `createdAt`), UNIQUE KEY `uq_measurement_photos_key` (`storageKey`), ' +
        'CONSTRAINT `fk_measurement_photos_sheet` FOREIGN KEY (`sheetId`) REFERENCES `measurement_sheets` (`id`) ON DELETE CASCADE) ' + tail,
    );
    await q.query(
      'CREATE TABLE `measurement_settings` (`shopId` char(36) NOT NULL, `deviationLimitMm` decimal(8,2) NOT NULL, `deviationLimitDeg` decimal(6,2) NOT NULL, ' +
        'PRIMARY KEY (`shopId`), CONSTRAINT `fk_measurement_settings_shop` FOREIGN KEY (`shopId`) REFERENCES `shops` (`id`) ON DELETE CASCADE) ' + tail,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['measurement_settings', 'measurement_photos', 'measurement_sheet_events', 'measurement_values', 'measurement_sheets', 'measurement_templates']) {
      await q.query(`DROP TABLE \`${table}\``);
    }
  }
}
