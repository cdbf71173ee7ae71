import { MigrationInterface, QueryRunner } from 'typeorm'

/** Indexes for the lists' sorts and the quotes' expiry sweep, so a page reads only its rows. */
export class ListIndexes1796400000000 implements MigrationInterface {
  name = 'ListIndexes1796400000000'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE INDEX \`IDX_quotes_created\` ON \`quotes\` (\`createdAt\`, \`id\`)`,
    )
    await queryRunner.query(
      `CREATE INDEX \`IDX_quotes_expiry\` ON \`quotes\` (\`state\`, \`validUntil\`)`,
    )
    await queryRunner.query(`CREATE INDEX \`IDX_sizings_updated\` ON \`sizings\` (\`updatedAt\`)`)
    await queryRunner.query(`CREATE INDEX \`IDX_sites_updated\` ON \`sites\` (\`updatedAt\`)`)
    await queryRunner.query(
      `CREATE INDEX \`IDX_work_orders_due\` ON \`work_orders\` (\`dueDate\`, \`id\`)`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`IDX_work_orders_due\` ON \`work_orders\``)
    await queryRunner.query(`DROP INDEX \`IDX_sites_updated\` ON \`sites\``)
    await queryRunner.query(`DROP INDEX \`IDX_sizings_updated\` ON \`sizings\``)
    await queryRunner.query(`DROP INDEX \`IDX_quotes_expiry\` ON \`quotes\``)
    await queryRunner.query(`DROP INDEX \`IDX_quotes_created\` ON \`quotes\``)
  }
}
