import { MigrationInterface, QueryRunner } from 'typeorm'

export class Production1796202027823 implements MigrationInterface {
  name = 'Production1796202027823'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`work_orders\` (\`id\` int NOT NULL AUTO_INCREMENT, \`orderId\` int NOT NULL, \`quoteId\` int NOT NULL, \`companyId\` int NOT NULL, \`specification\` longtext NOT NULL, \`specHash\` char(64) NOT NULL, \`state\` varchar(16) NOT NULL DEFAULT 'queued', \`dueDate\` date NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), UNIQUE INDEX \`IDX_060283efca551b0d01175359c5\` (\`orderId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`work_order_events\` (\`id\` int NOT NULL AUTO_INCREMENT, \`workOrderId\` int NOT NULL, \`kind\` varchar(16) NOT NULL, \`fromState\` varchar(16) NULL, \`toState\` varchar(16) NULL, \`measuredHz\` double NULL, \`dampingRatio\` double NULL, \`passes\` tinyint NULL, \`actorId\` int NULL, \`at\` datetime(3) NOT NULL, \`note\` varchar(500) NOT NULL DEFAULT '', INDEX \`IDX_7132fdf4392b5c4c3522bedfc9\` (\`workOrderId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `DROP INDEX \`IDX_7132fdf4392b5c4c3522bedfc9\` ON \`work_order_events\``,
    )
    await queryRunner.query(`DROP TABLE \`work_order_events\``)
    await queryRunner.query(`DROP INDEX \`IDX_060283efca551b0d01175359c5\` ON \`work_orders\``)
    await queryRunner.query(`DROP TABLE \`work_orders\``)
  }
}
