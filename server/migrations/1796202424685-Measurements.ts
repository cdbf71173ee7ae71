import { MigrationInterface, QueryRunner } from 'typeorm'

export class Measurements1796202424685 implements MigrationInterface {
  name = 'Measurements1796202424685'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`measurement_records\` (\`id\` int NOT NULL AUTO_INCREMENT, \`siteId\` int NOT NULL, \`modelId\` int NULL, \`nodeId\` varchar(60) NULL, \`ownerId\` int NOT NULL, \`filename\` varchar(200) NOT NULL, \`storedName\` varchar(80) NOT NULL, \`size\` int NOT NULL, \`sampleRateHz\` double NOT NULL, \`samples\` int NOT NULL, \`rateFromForm\` tinyint NOT NULL DEFAULT 0, \`kind\` varchar(20) NOT NULL, \`result\` longtext NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `ALTER TABLE \`measurement_records\` ADD CONSTRAINT \`FK_5eab38aa7eeffa8f77a8c1e89cd\` FOREIGN KEY (\`siteId\`) REFERENCES \`sites\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`measurement_records\` ADD CONSTRAINT \`FK_09dfdc2ad8a5a8172f20259f8bb\` FOREIGN KEY (\`ownerId\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`measurement_records\` DROP FOREIGN KEY \`FK_09dfdc2ad8a5a8172f20259f8bb\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`measurement_records\` DROP FOREIGN KEY \`FK_5eab38aa7eeffa8f77a8c1e89cd\``,
    )
    await queryRunner.query(`DROP TABLE \`measurement_records\``)
  }
}
