import { MigrationInterface, QueryRunner } from 'typeorm'

/** Several absorbers on one sizing: the units a quote line supplies, the unit a tuning is of. */
export class AbsorberSets1796510000000 implements MigrationInterface {
  name = 'AbsorberSets1796510000000'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`quote_lines\` ADD \`absorbers\` varchar(60) NULL`)
    await queryRunner.query(`ALTER TABLE \`work_order_events\` ADD \`absorber\` int NULL`)
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`work_order_events\` DROP COLUMN \`absorber\``)
    await queryRunner.query(`ALTER TABLE \`quote_lines\` DROP COLUMN \`absorbers\``)
  }
}
