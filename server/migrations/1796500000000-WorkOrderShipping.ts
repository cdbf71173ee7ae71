import { MigrationInterface, QueryRunner } from 'typeorm'

/**
 * Work orders keep their order's number (searched and sorted in the queue), the delivery contact
 * read when the order was paid, and what shipping records: carrier, tracking number, the units'
 * serial numbers and when it left.
 */
export class WorkOrderShipping1796500000000 implements MigrationInterface {
  name = 'WorkOrderShipping1796500000000'

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`work_orders\` ADD \`orderNumber\` varchar(24) NOT NULL DEFAULT '', ADD \`delivery\` longtext NULL, ADD \`carrier\` varchar(80) NULL, ADD \`trackingNumber\` varchar(80) NULL, ADD \`serialNumbers\` longtext NULL, ADD \`shippedAt\` datetime(3) NULL`,
    )
    // The number the payments module prints for an order: ORD-<year paid>-<id, four digits>.
    await queryRunner.query(
      `UPDATE \`work_orders\` w JOIN \`orders\` o ON o.\`id\` = w.\`orderId\` SET w.\`orderNumber\` = CONCAT('ORD-', YEAR(o.\`paidAt\`), '-', IF(o.\`id\` < 10000, LPAD(o.\`id\`, 4, '0'), o.\`id\`))`,
    )
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`work_orders\` DROP COLUMN \`shippedAt\`, DROP COLUMN \`serialNumbers\`, DROP COLUMN \`trackingNumber\`, DROP COLUMN \`carrier\`, DROP COLUMN \`delivery\`, DROP COLUMN \`orderNumber\``,
    )
  }
}
