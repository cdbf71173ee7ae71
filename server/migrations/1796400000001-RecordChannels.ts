import { MigrationInterface, QueryRunner } from 'typeorm'

/** Every channel of a record with its node and axis, the time unit read, and modal analyses. */
export class RecordChannels1796400000001 implements MigrationInterface {
  name = 'RecordChannels1796400000001'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`measurement_records\` ADD \`channels\` longtext NULL, ADD \`timeUnit\` varchar(2) NULL, ADD \`timeUnitSource\` varchar(10) NULL`,
    )
    await queryRunner.query(
      `CREATE TABLE \`record_analyses\` (\`id\` int NOT NULL AUTO_INCREMENT, \`recordId\` int NOT NULL, \`ownerId\` int NOT NULL, \`method\` varchar(10) NOT NULL, \`modes\` longtext NOT NULL, \`result\` longtext NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `ALTER TABLE \`record_analyses\` ADD CONSTRAINT \`FK_record_analyses_record\` FOREIGN KEY (\`recordId\`) REFERENCES \`measurement_records\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`record_analyses\` ADD CONSTRAINT \`FK_record_analyses_owner\` FOREIGN KEY (\`ownerId\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`record_analyses\` DROP FOREIGN KEY \`FK_record_analyses_owner\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`record_analyses\` DROP FOREIGN KEY \`FK_record_analyses_record\``,
    )
    await queryRunner.query(`DROP TABLE \`record_analyses\``)
    await queryRunner.query(
      `ALTER TABLE \`measurement_records\` DROP COLUMN \`timeUnitSource\`, DROP COLUMN \`timeUnit\`, DROP COLUMN \`channels\``,
    )
  }
}
