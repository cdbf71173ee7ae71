import { MigrationInterface, QueryRunner } from 'typeorm'

export class ModelsSizings1796198622102 implements MigrationInterface {
  name = 'ModelsSizings1796198622102'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`host_models\` (\`id\` int NOT NULL AUTO_INCREMENT, \`siteId\` int NOT NULL, \`ownerId\` int NOT NULL, \`name\` varchar(160) NOT NULL, \`currentRevision\` int NOT NULL DEFAULT '1', \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`model_revisions\` (\`id\` int NOT NULL AUTO_INCREMENT, \`modelId\` int NOT NULL, \`revision\` int NOT NULL, \`definition\` longtext NOT NULL, \`reason\` varchar(300) NOT NULL DEFAULT '', \`createdById\` int NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), UNIQUE INDEX \`IDX_c47d07e1b46e9fdca3c33dc5eb\` (\`modelId\`, \`revision\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`sizings\` (\`id\` int NOT NULL AUTO_INCREMENT, \`siteId\` int NOT NULL, \`modelId\` int NOT NULL, \`ownerId\` int NOT NULL, \`title\` varchar(160) NOT NULL, \`state\` varchar(16) NOT NULL DEFAULT 'draft', \`currentRevision\` int NOT NULL DEFAULT '1', \`submittedAt\` datetime(3) NULL, \`handoverNote\` varchar(2000) NOT NULL DEFAULT '', \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`sizing_revisions\` (\`id\` int NOT NULL AUTO_INCREMENT, \`sizingId\` int NOT NULL, \`revision\` int NOT NULL, \`input\` longtext NOT NULL, \`evaluation\` longtext NOT NULL, \`summary\` longtext NOT NULL, \`createdById\` int NOT NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), UNIQUE INDEX \`IDX_8762949e484456cb8a537067f1\` (\`sizingId\`, \`revision\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `ALTER TABLE \`host_models\` ADD CONSTRAINT \`FK_4188409a7ad521da0e9c5b1f09d\` FOREIGN KEY (\`siteId\`) REFERENCES \`sites\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`host_models\` ADD CONSTRAINT \`FK_8d1182eb115f63a236c7c129850\` FOREIGN KEY (\`ownerId\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`model_revisions\` ADD CONSTRAINT \`FK_85cad90fc22f6730acaa0b3586d\` FOREIGN KEY (\`modelId\`) REFERENCES \`host_models\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizings\` ADD CONSTRAINT \`FK_e78f84ba112b02bd38b3225bdd6\` FOREIGN KEY (\`siteId\`) REFERENCES \`sites\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizings\` ADD CONSTRAINT \`FK_e59e4586a148017a3ee9a0eb7f3\` FOREIGN KEY (\`modelId\`) REFERENCES \`host_models\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizings\` ADD CONSTRAINT \`FK_b9370b92b3b57d003742b4a344f\` FOREIGN KEY (\`ownerId\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizing_revisions\` ADD CONSTRAINT \`FK_1548bcd409c12f3ff0d81040397\` FOREIGN KEY (\`sizingId\`) REFERENCES \`sizings\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`sizing_revisions\` DROP FOREIGN KEY \`FK_1548bcd409c12f3ff0d81040397\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizings\` DROP FOREIGN KEY \`FK_b9370b92b3b57d003742b4a344f\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizings\` DROP FOREIGN KEY \`FK_e59e4586a148017a3ee9a0eb7f3\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`sizings\` DROP FOREIGN KEY \`FK_e78f84ba112b02bd38b3225bdd6\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`model_revisions\` DROP FOREIGN KEY \`FK_85cad90fc22f6730acaa0b3586d\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`host_models\` DROP FOREIGN KEY \`FK_8d1182eb115f63a236c7c129850\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`host_models\` DROP FOREIGN KEY \`FK_4188409a7ad521da0e9c5b1f09d\``,
    )
    await queryRunner.query(`DROP INDEX \`IDX_8762949e484456cb8a537067f1\` ON \`sizing_revisions\``)
    await queryRunner.query(`DROP TABLE \`sizing_revisions\``)
    await queryRunner.query(`DROP TABLE \`sizings\``)
    await queryRunner.query(`DROP INDEX \`IDX_c47d07e1b46e9fdca3c33dc5eb\` ON \`model_revisions\``)
    await queryRunner.query(`DROP TABLE \`model_revisions\``)
    await queryRunner.query(`DROP TABLE \`host_models\``)
  }
}
