import { MigrationInterface, QueryRunner } from 'typeorm'

/** The handed-over list's sort: submitted sizings, most recently handed over first. */
export class HandedOverIndex1796720000001 implements MigrationInterface {
  name = 'HandedOverIndex1796720000001'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE INDEX \`IDX_sizings_handed_over\` ON \`sizings\` (\`state\`, \`submittedAt\`)`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`IDX_sizings_handed_over\` ON \`sizings\``)
  }
}
