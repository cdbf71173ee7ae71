import { MigrationInterface, QueryRunner } from 'typeorm'

export class Sites1796195382472 implements MigrationInterface {
  name = 'Sites1796195382472'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`site_photos\` (\`id\` int NOT NULL AUTO_INCREMENT, \`siteId\` int NOT NULL, \`filename\` varchar(200) NOT NULL, \`storedName\` varchar(80) NOT NULL, \`contentType\` varchar(60) NOT NULL, \`size\` int NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`sites\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(160) NOT NULL, \`companyId\` int NOT NULL, \`ownerId\` int NOT NULL, \`address\` varchar(300) NOT NULL DEFAULT '', \`structureKind\` varchar(24) NOT NULL, \`contactName\` varchar(120) NOT NULL DEFAULT '', \`contactPhone\` varchar(40) NOT NULL DEFAULT '', \`notes\` text NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `ALTER TABLE \`site_photos\` ADD CONSTRAINT \`FK_b6eb0ffd495220679097a27a6d2\` FOREIGN KEY (\`siteId\`) REFERENCES \`sites\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`sites\` ADD CONSTRAINT \`FK_848a3c31ba20ef10f38f1be19fa\` FOREIGN KEY (\`companyId\`) REFERENCES \`companies\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`sites\` ADD CONSTRAINT \`FK_b00408635dde2a3b0cb6e57de17\` FOREIGN KEY (\`ownerId\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`sites\` DROP FOREIGN KEY \`FK_b00408635dde2a3b0cb6e57de17\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`sites\` DROP FOREIGN KEY \`FK_848a3c31ba20ef10f38f1be19fa\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`site_photos\` DROP FOREIGN KEY \`FK_b6eb0ffd495220679097a27a6d2\``,
    )
    await queryRunner.query(`DROP TABLE \`sites\``)
    await queryRunner.query(`DROP TABLE \`site_photos\``)
  }
}
