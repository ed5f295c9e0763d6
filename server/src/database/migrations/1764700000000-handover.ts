import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Shift handover sign-offs; ward shift times. */
export class Handover1764700000000 implements MigrationInterface {
  name = 'Handover1764700000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "dayShiftStart" varchar(5) NOT NULL DEFAULT ('07:00')`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "nightShiftStart" varchar(5) NOT NULL DEFAULT ('19:00')`);
    await queryRunner.query(
      `CREATE TABLE "handover_signoffs" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "wardId" integer NOT NULL, "orderId" integer NOT NULL, "shiftDate" varchar(10) NOT NULL, "shift" varchar(8) NOT NULL, "role" varchar(10) NOT NULL, "nurseId" integer NOT NULL, "pumpSettingsMatch" boolean, "at" datetime NOT NULL, CONSTRAINT "UQ_handover_signoffs_once" UNIQUE ("orderId", "shiftDate", "shift", "role"), CONSTRAINT "FK_cb81506ff6ddbb8cdc2bd3a652d" FOREIGN KEY ("orderId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_11b35af2f7d929058f7950eb9ae" FOREIGN KEY ("nurseId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_handover_signoffs_ward_shift" ON "handover_signoffs" ("wardId", "shiftDate", "shift")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "handover_signoffs"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "nightShiftStart"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "dayShiftStart"`);
  }
}
