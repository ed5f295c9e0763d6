import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A prescriber's own orders ("My orders", `GET /api/orders?mine=true`) by index instead of a scan
 * of every order the hospital ever signed (see docs/performance.md).
 */
export class OrderListsByPrescriber1764729000000 implements MigrationInterface {
  name = 'OrderListsByPrescriber1764729000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE INDEX "IDX_pca_orders_prescriber" ON "pca_orders" ("prescriberId")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_pca_orders_prescriber"`);
  }
}
