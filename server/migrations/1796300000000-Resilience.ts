import { MigrationInterface, QueryRunner } from 'typeorm'

/**
 * Session versions, shared rate-limit counters, the mail outbox, and the payment sessions'
 * reconciliation and refund columns.
 */
export class Resilience1796300000000 implements MigrationInterface {
  name = 'Resilience1796300000000'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`users\` ADD \`tokenVersion\` int NOT NULL DEFAULT '0'`)
    await queryRunner.query(
      `CREATE TABLE \`rate_limits\` (\`key\` varchar(255) NOT NULL, \`points\` int NOT NULL DEFAULT '0', \`expire\` bigint UNSIGNED NULL, PRIMARY KEY (\`key\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`outbox_mails\` (\`id\` int NOT NULL AUTO_INCREMENT, \`toAddress\` varchar(254) NOT NULL, \`subject\` varchar(300) NOT NULL, \`message\` longtext NOT NULL, \`state\` varchar(12) NOT NULL DEFAULT 'pending', \`attempts\` int NOT NULL DEFAULT '0', \`nextAttemptAt\` datetime(3) NOT NULL, \`lastError\` varchar(500) NULL, \`sentAt\` datetime(3) NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), INDEX \`IDX_outbox_mails_due\` (\`state\`, \`nextAttemptAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `ALTER TABLE \`payment_sessions\` ADD \`nextCheckAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3)`,
    )
    await queryRunner.query(
      `ALTER TABLE \`payment_sessions\` ADD \`paymentIntent\` varchar(255) NULL`,
    )
    await queryRunner.query(`ALTER TABLE \`payment_sessions\` ADD \`refundId\` varchar(255) NULL`)
    await queryRunner.query(`ALTER TABLE \`payment_sessions\` ADD \`refundedAt\` datetime(3) NULL`)
    await queryRunner.query(
      `CREATE INDEX \`IDX_payment_sessions_due\` ON \`payment_sessions\` (\`status\`, \`nextCheckAt\`)`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`IDX_payment_sessions_due\` ON \`payment_sessions\``)
    await queryRunner.query(`ALTER TABLE \`payment_sessions\` DROP COLUMN \`refundedAt\``)
    await queryRunner.query(`ALTER TABLE \`payment_sessions\` DROP COLUMN \`refundId\``)
    await queryRunner.query(`ALTER TABLE \`payment_sessions\` DROP COLUMN \`paymentIntent\``)
    await queryRunner.query(`ALTER TABLE \`payment_sessions\` DROP COLUMN \`nextCheckAt\``)
    await queryRunner.query(`DROP TABLE \`outbox_mails\``)
    await queryRunner.query(`DROP TABLE \`rate_limits\``)
    await queryRunner.query(`ALTER TABLE \`users\` DROP COLUMN \`tokenVersion\``)
  }
}
