import { MigrationInterface, QueryRunner } from 'typeorm'

export class Commerce1796197028777 implements MigrationInterface {
  name = 'Commerce1796197028777'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`product_lines\` (\`id\` int NOT NULL AUTO_INCREMENT, \`code\` varchar(24) NOT NULL, \`name\` varchar(120) NOT NULL, \`description\` varchar(1000) NOT NULL DEFAULT '', \`orientation\` varchar(16) NOT NULL, \`damperType\` varchar(24) NOT NULL, \`massMin\` double NOT NULL, \`massMax\` double NOT NULL, \`massStep\` int NOT NULL, \`frequencyMin\` double NOT NULL, \`frequencyMax\` double NOT NULL, \`strokeLimit\` double NOT NULL, \`dampingMin\` double NOT NULL, \`dampingMax\` double NOT NULL, \`leadTimeWeeks\` int NOT NULL, \`basePriceEur\` int NOT NULL, \`perKgEur\` int NOT NULL, \`basePriceGbp\` int NOT NULL, \`perKgGbp\` int NOT NULL, \`active\` tinyint NOT NULL DEFAULT 1, UNIQUE INDEX \`IDX_6d49aecb61568bccf5ddaa70ee\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`catalogue_options\` (\`id\` int NOT NULL AUTO_INCREMENT, \`code\` varchar(24) NOT NULL, \`name\` varchar(120) NOT NULL, \`kind\` varchar(16) NOT NULL, \`per\` varchar(24) NOT NULL, \`priceEur\` int NOT NULL, \`priceGbp\` int NOT NULL, \`active\` tinyint NOT NULL DEFAULT 1, UNIQUE INDEX \`IDX_e71d93459cb304ef30e33f395f\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`contacts\` (\`id\` int NOT NULL AUTO_INCREMENT, \`companyId\` int NOT NULL, \`name\` varchar(120) NOT NULL, \`email\` varchar(254) NOT NULL, \`phone\` varchar(40) NOT NULL DEFAULT '', \`position\` varchar(120) NOT NULL DEFAULT '', \`userId\` int NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`quote_lines\` (\`id\` int NOT NULL AUTO_INCREMENT, \`quoteId\` int NOT NULL, \`position\` int NOT NULL, \`kind\` varchar(16) NOT NULL, \`productLineId\` int NULL, \`optionId\` int NULL, \`code\` varchar(24) NOT NULL, \`description\` varchar(300) NOT NULL, \`builtMass\` double NULL, \`quantity\` int NOT NULL, \`unitPrice\` int NOT NULL, \`lineTotal\` int NOT NULL, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`quotes\` (\`id\` int NOT NULL AUTO_INCREMENT, \`number\` varchar(24) NOT NULL, \`year\` int NOT NULL, \`seq\` int NOT NULL, \`revision\` int NOT NULL, \`state\` varchar(16) NOT NULL, \`sizingId\` int NOT NULL, \`sizing\` longtext NOT NULL, \`companyId\` int NOT NULL, \`contactId\` int NULL, \`currency\` varchar(3) NOT NULL, \`discountBp\` int NOT NULL, \`taxBp\` int NOT NULL, \`validUntil\` varchar(10) NOT NULL, \`terms\` text NOT NULL, \`subtotal\` int NOT NULL, \`discount\` int NOT NULL, \`discountedSubtotal\` int NOT NULL, \`tax\` int NOT NULL, \`total\` int NOT NULL, \`createdById\` int NOT NULL, \`sentAt\` datetime(3) NULL, \`acceptedAt\` datetime(3) NULL, \`acceptedName\` varchar(120) NULL, \`purchaseOrder\` varchar(60) NULL, \`paidAt\` datetime(3) NULL, \`createdAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updatedAt\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), UNIQUE INDEX \`UQ_quotes_year_seq_revision\` (\`year\`, \`seq\`, \`revision\`), UNIQUE INDEX \`UQ_quotes_number_revision\` (\`number\`, \`revision\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `CREATE TABLE \`quote_events\` (\`id\` int NOT NULL AUTO_INCREMENT, \`quoteId\` int NOT NULL, \`fromState\` varchar(16) NULL, \`toState\` varchar(16) NOT NULL, \`actorId\` int NULL, \`at\` datetime(3) NOT NULL, \`note\` varchar(500) NOT NULL DEFAULT '', INDEX \`IDX_quote_events_quote_at\` (\`quoteId\`, \`at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    )
    await queryRunner.query(
      `ALTER TABLE \`contacts\` ADD CONSTRAINT \`FK_f4809f4f9ad4a220959788def42\` FOREIGN KEY (\`companyId\`) REFERENCES \`companies\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`contacts\` ADD CONSTRAINT \`FK_30ef77942fc8c05fcb829dcc61d\` FOREIGN KEY (\`userId\`) REFERENCES \`users\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`quote_lines\` ADD CONSTRAINT \`FK_b37b2b6c6c350a5439d90e092da\` FOREIGN KEY (\`quoteId\`) REFERENCES \`quotes\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`quotes\` ADD CONSTRAINT \`FK_de675450c5a820df2a8a0730072\` FOREIGN KEY (\`companyId\`) REFERENCES \`companies\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`quotes\` ADD CONSTRAINT \`FK_4bf53b33a11c8a004cc60754335\` FOREIGN KEY (\`contactId\`) REFERENCES \`contacts\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`quotes\` ADD CONSTRAINT \`FK_3c3c38f2fc5c43fb8e8440ca012\` FOREIGN KEY (\`createdById\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`quote_events\` ADD CONSTRAINT \`FK_da3a1249567c5662470729b30fb\` FOREIGN KEY (\`quoteId\`) REFERENCES \`quotes\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    )
    await queryRunner.query(
      `ALTER TABLE \`quote_events\` ADD CONSTRAINT \`FK_5e2a004a4f2cd65b2ee53bca663\` FOREIGN KEY (\`actorId\`) REFERENCES \`users\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`quote_events\` DROP FOREIGN KEY \`FK_5e2a004a4f2cd65b2ee53bca663\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`quote_events\` DROP FOREIGN KEY \`FK_da3a1249567c5662470729b30fb\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`quotes\` DROP FOREIGN KEY \`FK_3c3c38f2fc5c43fb8e8440ca012\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`quotes\` DROP FOREIGN KEY \`FK_4bf53b33a11c8a004cc60754335\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`quotes\` DROP FOREIGN KEY \`FK_de675450c5a820df2a8a0730072\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`quote_lines\` DROP FOREIGN KEY \`FK_b37b2b6c6c350a5439d90e092da\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`contacts\` DROP FOREIGN KEY \`FK_30ef77942fc8c05fcb829dcc61d\``,
    )
    await queryRunner.query(
      `ALTER TABLE \`contacts\` DROP FOREIGN KEY \`FK_f4809f4f9ad4a220959788def42\``,
    )
    await queryRunner.query(`DROP INDEX \`IDX_quote_events_quote_at\` ON \`quote_events\``)
    await queryRunner.query(`DROP TABLE \`quote_events\``)
    await queryRunner.query(`DROP INDEX \`UQ_quotes_number_revision\` ON \`quotes\``)
    await queryRunner.query(`DROP INDEX \`UQ_quotes_year_seq_revision\` ON \`quotes\``)
    await queryRunner.query(`DROP TABLE \`quotes\``)
    await queryRunner.query(`DROP TABLE \`quote_lines\``)
    await queryRunner.query(`DROP TABLE \`contacts\``)
    await queryRunner.query(
      `DROP INDEX \`IDX_e71d93459cb304ef30e33f395f\` ON \`catalogue_options\``,
    )
    await queryRunner.query(`DROP TABLE \`catalogue_options\``)
    await queryRunner.query(`DROP INDEX \`IDX_6d49aecb61568bccf5ddaa70ee\` ON \`product_lines\``)
    await queryRunner.query(`DROP TABLE \`product_lines\``)
  }
}
