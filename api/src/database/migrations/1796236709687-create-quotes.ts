import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The shop's labor operations, quotes with their revisions (a sent revision is never updated), the shop's
 * quoting terms and the in-app notes to the estimator. A project with a quote cannot be deleted (RESTRICT).
 */
export class CreateQuotes1796236709687 implements MigrationInterface {
  name = 'CreateQuotes1796236709687';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`labor_operations\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`code\` varchar(60) NOT NULL,
        \`name\` varchar(160) NOT NULL,
        \`bookHours\` decimal(5,1) NOT NULL,
        \`buildOrder\` int NOT NULL DEFAULT 100,
        \`matches\` json NOT NULL,
        \`hazards\` json NOT NULL,
        \`torqueSpecs\` json NOT NULL,
        \`checks\` json NOT NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`ux_labor_operations_shop_code\` (\`shopId\`, \`code\`),
        CONSTRAINT \`fk_labor_operations_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`quotes\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`projectId\` char(36) NOT NULL,
        \`number\` int NOT NULL,
        \`status\` varchar(20) NOT NULL DEFAULT 'drafting',
        \`latestRevision\` int NOT NULL DEFAULT 1,
        \`sentRevision\` int NULL,
        \`sentById\` char(36) NULL,
        \`answeredAt\` datetime(3) NULL,
        \`declineReason\` varchar(1000) NULL,
        \`depositState\` varchar(12) NOT NULL DEFAULT 'not-due',
        \`depositPaidAt\` datetime(3) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`ux_quotes_shop_number\` (\`shopId\`, \`number\`),
        KEY \`ix_quotes_shop_project\` (\`shopId\`, \`projectId\`, \`createdAt\`),
        CONSTRAINT \`fk_quotes_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_quotes_project\` FOREIGN KEY (\`projectId\`) REFERENCES \`projects\` (\`id\`) ON DELETE RESTRICT,
        CONSTRAINT \`fk_quotes_sent_by\` FOREIGN KEY (\`sentById\`) REFERENCES \`users\` (\`id\`) ON DELETE SET NULL
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`quote_revisions\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`quoteId\` char(36) NOT NULL,
        \`number\` int NOT NULL,
        \`fitReportId\` char(36) NULL,
        \`partsPlanId\` char(36) NULL,
        \`partsPlanVersion\` int NULL,
        \`validUntil\` date NOT NULL,
        \`currency\` char(3) NOT NULL,
        \`laborRateCents\` int NOT NULL,
        \`suppliesPercent\` decimal(8,4) NOT NULL,
        \`suppliesCapCents\` int NULL,
        \`partsTaxPercent\` decimal(8,4) NOT NULL,
        \`laborTaxPercent\` decimal(8,4) NOT NULL,
        \`discountKind\` varchar(8) NOT NULL,
        \`discountPercent\` decimal(8,4) NULL,
        \`discountAmountCents\` int NULL,
        \`depositKind\` varchar(8) NOT NULL,
        \`depositPercent\` decimal(8,4) NULL,
        \`depositAmountCents\` int NULL,
        \`terms\` text NOT NULL,
        \`notes\` varchar(2000) NOT NULL DEFAULT '',
        \`lines\` json NOT NULL,
        \`totals\` json NOT NULL,
        \`createdById\` char(36) NULL,
        \`sentAt\` datetime(3) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`ux_quote_revisions_quote_number\` (\`quoteId\`, \`number\`),
        KEY \`ix_quote_revisions_shop\` (\`shopId\`),
        CONSTRAINT \`fk_quote_revisions_quote\` FOREIGN KEY (\`quoteId\`) REFERENCES \`quotes\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_quote_revisions_fit_report\` FOREIGN KEY (\`fitReportId\`) REFERENCES \`fit_reports\` (\`id\`) ON DELETE RESTRICT,
        CONSTRAINT \`fk_quote_revisions_created_by\` FOREIGN KEY (\`createdById\`) REFERENCES \`users\` (\`id\`) ON DELETE SET NULL
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`quote_settings\` (
        \`shopId\` char(36) NOT NULL,
        \`laborTaxPercent\` decimal(8,4) NOT NULL DEFAULT 0,
        \`suppliesCapCents\` int NULL,
        \`depositPercent\` decimal(8,4) NOT NULL DEFAULT 30,
        \`validityDays\` int NOT NULL DEFAULT 30,
        \`defaultMarkupPercent\` decimal(8,4) NOT NULL DEFAULT 30,
        \`terms\` text NOT NULL,
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`shopId\`),
        CONSTRAINT \`fk_quote_settings_shop\` FOREIGN KEY (\`shopId\`) REFERENCES \`shops\` (\`id\`) ON DELETE CASCADE
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`quote_notifications\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`userId\` char(36) NOT NULL,
        \`quoteId\` char(36) NOT NULL,
        \`projectId\` char(36) NOT NULL,
        \`message\` varchar(500) NOT NULL,
        \`readAt\` datetime(3) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        KEY \`ix_quote_notifications_user\` (\`shopId\`, \`userId\`, \`createdAt\`),
        CONSTRAINT \`fk_quote_notifications_quote\` FOREIGN KEY (\`quoteId\`) REFERENCES \`quotes\` (\`id\`) ON DELETE CASCADE,
        CONSTRAINT \`fk_quote_notifications_user\` FOREIGN KEY (\`userId\`) REFERENCES \`users\` (\`id\`) ON DELETE CASCADE
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `quote_notifications`');
    await queryRunner.query('DROP TABLE `quote_settings`');
    await queryRunner.query('DROP TABLE `quote_revisions`');
    await queryRunner.query('DROP TABLE `quotes`');
    await queryRunner.query('DROP TABLE `labor_operations`');
  }
}
