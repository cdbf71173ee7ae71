import { MigrationInterface, QueryRunner } from 'typeorm'

/**
 * What the quotes list shows, stored on each revision instead of worked out per row on every
 * read: whether it is its number's latest revision (was a MAX subquery per row), and the frozen
 * sizing's title and site name (were read out of the sizing JSON per row). Existing rows are
 * filled in; `updatedAt = updatedAt` keeps their last-change moment as it was.
 */
export class QuoteListColumns1796720000000 implements MigrationInterface {
  name = 'QuoteListColumns1796720000000'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`quotes\` ADD \`latest\` tinyint NOT NULL DEFAULT 0`)
    await queryRunner.query(
      `ALTER TABLE \`quotes\` ADD \`sizingTitle\` varchar(160) NOT NULL DEFAULT ''`,
    )
    await queryRunner.query(
      `ALTER TABLE \`quotes\` ADD \`siteName\` varchar(160) NOT NULL DEFAULT ''`,
    )
    await queryRunner.query(
      `UPDATE \`quotes\` q JOIN (SELECT \`number\`, MAX(\`revision\`) AS \`revision\` FROM \`quotes\` GROUP BY \`number\`) m ON m.\`number\` = q.\`number\` AND m.\`revision\` = q.\`revision\` SET q.\`latest\` = 1, q.\`updatedAt\` = q.\`updatedAt\``,
    )
    await queryRunner.query(
      `UPDATE \`quotes\` SET \`sizingTitle\` = LEFT(COALESCE(JSON_VALUE(\`sizing\`, '$.title'), ''), 160), \`siteName\` = LEFT(COALESCE(JSON_VALUE(\`sizing\`, '$.siteName'), ''), 160), \`updatedAt\` = \`updatedAt\``,
    )
    await queryRunner.query(`ALTER TABLE \`quotes\` ALTER \`latest\` DROP DEFAULT`)
    await queryRunner.query(`ALTER TABLE \`quotes\` ALTER \`sizingTitle\` DROP DEFAULT`)
    await queryRunner.query(`ALTER TABLE \`quotes\` ALTER \`siteName\` DROP DEFAULT`)
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`quotes\` DROP COLUMN \`siteName\``)
    await queryRunner.query(`ALTER TABLE \`quotes\` DROP COLUMN \`sizingTitle\``)
    await queryRunner.query(`ALTER TABLE \`quotes\` DROP COLUMN \`latest\``)
  }
}
