import { MigrationInterface, QueryRunner } from 'typeorm'

export class Payments1796201603698 implements MigrationInterface {
  name = 'Payments1796201603698'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`payment_sessions\` (\`id\` int NOT NULL AUTO_INCREMENT, \`sessionId\` varchar(255) NOT NULL, \`quoteId\` int NOT NULL, \`amount\` int NOT NULL, \`currency\` varchar(3) NOT NULL, \`status\` varchar(12) NOT NULL DEFAULT 'open', \`createdById\` int NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), UNIQUE INDEX \`IDX_97df942172417fce7943a09f40\` (\`sessionId\`), INDEX \`IDX_61362149ba4d619db7c4fb6fa2\` (\`quoteId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`payment_events\` (\`eventId\` varchar(255) NOT NULL, \`type\` varchar(80) NOT NULL, \`sessionId\` varchar(255) NOT NULL DEFAULT '', \`receivedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), PRIMARY KEY (\`eventId\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`orders\` (\`id\` int NOT NULL AUTO_INCREMENT, \`quoteId\` int NOT NULL, \`companyId\` int NOT NULL, \`sessionId\` varchar(255) NOT NULL, \`amount\` int NOT NULL, \`currency\` varchar(3) NOT NULL, \`status\` varchar(16) NOT NULL DEFAULT 'confirmed', \`paidAt\` datetime(3) NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), UNIQUE INDEX \`IDX_95a206b8b8cafbd842d39aba6c\` (\`quoteId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`IDX_95a206b8b8cafbd842d39aba6c\` ON \`orders\``)
    await queryRunner.query(`DROP TABLE \`orders\``)
    await queryRunner.query(`DROP TABLE \`payment_events\``)
    await queryRunner.query(`DROP INDEX \`IDX_61362149ba4d619db7c4fb6fa2\` ON \`payment_sessions\``)
    await queryRunner.query(`DROP INDEX \`IDX_97df942172417fce7943a09f40\` ON \`payment_sessions\``)
    await queryRunner.query(`DROP TABLE \`payment_sessions\``)
  }
}
