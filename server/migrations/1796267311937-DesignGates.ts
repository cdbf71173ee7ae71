import { MigrationInterface, QueryRunner } from 'typeorm'

export class DesignGates1796267311937 implements MigrationInterface {
  name = 'DesignGates1796267311937'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`sizing_acknowledgements\` (\`id\` int NOT NULL AUTO_INCREMENT, \`sizingId\` int NOT NULL, \`revision\` int NOT NULL, \`failedChecks\` longtext NOT NULL, \`reason\` varchar(1000) NOT NULL, \`acknowledgedById\` int NOT NULL, \`acknowledgedAt\` datetime(3) NOT NULL, INDEX \`IDX_27e9a028b481ab85b6e404ece3\` (\`sizingId\`, \`revision\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(`ALTER TABLE \`sizings\` ADD \`acknowledgementId\` int NULL`)
    await queryRunner.query(`ALTER TABLE \`quotes\` ADD \`designConfirmedById\` int NULL`)
    await queryRunner.query(`ALTER TABLE \`quotes\` ADD \`designConfirmedAt\` datetime(3) NULL`)
    await queryRunner.query(
      `ALTER TABLE \`sizing_acknowledgements\` ADD CONSTRAINT \`FK_e29688aefbfe990c2d73a50033e\` FOREIGN KEY (\`sizingId\`) REFERENCES \`sizings\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizing_acknowledgements\` ADD CONSTRAINT \`FK_28a01a03da22be95d6a5bb88bed\` FOREIGN KEY (\`acknowledgedById\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizings\` ADD CONSTRAINT \`FK_1659031ff776041184f974f418c\` FOREIGN KEY (\`acknowledgementId\`) REFERENCES \`sizing_acknowledgements\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`quotes\` ADD CONSTRAINT \`FK_bf591162bca0921cbb3e91d15a5\` FOREIGN KEY (\`designConfirmedById\`) REFERENCES \`users\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`quotes\` DROP FOREIGN KEY \`FK_bf591162bca0921cbb3e91d15a5\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizings\` DROP FOREIGN KEY \`FK_1659031ff776041184f974f418c\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizing_acknowledgements\` DROP FOREIGN KEY \`FK_28a01a03da22be95d6a5bb88bed\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizing_acknowledgements\` DROP FOREIGN KEY \`FK_e29688aefbfe990c2d73a50033e\``,
    )
    await queryRunner.query(`ALTER TABLE \`quotes\` DROP COLUMN \`designConfirmedAt\``)
    await queryRunner.query(`ALTER TABLE \`quotes\` DROP COLUMN \`designConfirmedById\``)
    await queryRunner.query(`ALTER TABLE \`sizings\` DROP COLUMN \`acknowledgementId\``)
    await queryRunner.query(
      `DROP INDEX \`IDX_27e9a028b481ab85b6e404ece3\` ON \`sizing_acknowledgements\``,
    )
    await queryRunner.query(`DROP TABLE \`sizing_acknowledgements\``)
  }
}
