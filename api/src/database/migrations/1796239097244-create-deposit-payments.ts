import { MigrationInterface, QueryRunner } from 'typeorm';

/** Deposit payments (one row per PaymentIntent) and the provider events already applied (their id is the key). */
export class CreateDepositPayments1796239097244 implements MigrationInterface {
  name = 'CreateDepositPayments1796239097244';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE TABLE \`deposit_payments\` (
        \`id\` char(36) NOT NULL,
        \`shopId\` char(36) NOT NULL,
        \`quoteId\` char(36) NOT NULL,
        \`intentId\` varchar(80) NOT NULL,
        \`amountCents\` int NOT NULL,
        \`currency\` char(3) NOT NULL,
        \`state\` varchar(10) NOT NULL,
        \`lastError\` varchar(300) NULL,
        \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`id\`),
        UNIQUE KEY \`ux_deposit_payments_intent\` (\`intentId\`),
        KEY \`ix_deposit_payments_quote\` (\`quoteId\`, \`createdAt\`),
        CONSTRAINT \`fk_deposit_payments_quote\` FOREIGN KEY (\`quoteId\`) REFERENCES \`quotes\` (\`id\`) ON DELETE RESTRICT
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`
      CREATE TABLE \`payment_events\` (
        \`eventId\` varchar(80) NOT NULL,
        \`type\` varchar(60) NOT NULL,
        \`intentId\` varchar(80) NULL,
        \`receivedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
        PRIMARY KEY (\`eventId\`)
      ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `payment_events`');
    await queryRunner.query('DROP TABLE `deposit_payments`');
  }
}
