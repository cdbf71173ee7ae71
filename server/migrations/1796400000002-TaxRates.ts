import { MigrationInterface, QueryRunner } from 'typeorm'

/** Named tax rates, a customer company's own rate, and the rate each quote was priced with. */
export class TaxRates1796400000002 implements MigrationInterface {
  name = 'TaxRates1796400000002'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`tax_rates\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(60) NOT NULL, \`rateBp\` int NOT NULL, \`isDefault\` tinyint NOT NULL DEFAULT 0, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), UNIQUE INDEX \`IDX_947673ef814ab2a59ad8afa682\` (\`name\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`company_tax_rates\` (\`companyId\` int NOT NULL, \`taxRateId\` int NOT NULL, PRIMARY KEY (\`companyId\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(`ALTER TABLE \`quotes\` ADD \`taxRateId\` int NULL`)
    await queryRunner.query(`ALTER TABLE \`quotes\` ADD \`taxRateName\` varchar(60) NULL`)
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`quotes\` DROP COLUMN \`taxRateName\``)
    await queryRunner.query(`ALTER TABLE \`quotes\` DROP COLUMN \`taxRateId\``)
    await queryRunner.query(`DROP TABLE \`company_tax_rates\``)
    await queryRunner.query(`DROP INDEX \`IDX_947673ef814ab2a59ad8afa682\` ON \`tax_rates\``)
    await queryRunner.query(`DROP TABLE \`tax_rates\``)
  }
}
