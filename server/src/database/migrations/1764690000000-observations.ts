import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Observations; ward monitoring policy; the syringe a flag is about. */
export class Observations1764690000000 implements MigrationInterface {
  name = 'Observations1764690000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "observationIntervalFirst24hMinutes" integer NOT NULL DEFAULT (60)`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "observationIntervalMinutes" integer NOT NULL DEFAULT (120)`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "respiratoryRateThreshold" integer NOT NULL DEFAULT (8)`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "spo2Threshold" integer NOT NULL DEFAULT (90)`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "syringeLowThresholdHours" real NOT NULL DEFAULT (2)`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "painNotControlledScore" integer NOT NULL DEFAULT (7)`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "painNotControlledRatio" real NOT NULL DEFAULT (2)`);
    await queryRunner.query(`ALTER TABLE "flags" ADD COLUMN "releaseId" integer`);
    await queryRunner.query(
      `CREATE TABLE "observations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "orderId" integer NOT NULL, "releaseId" integer NOT NULL, "at" datetime NOT NULL, "painScore" integer NOT NULL, "sedationLevel" varchar(2) NOT NULL, "respiratoryRate" integer NOT NULL, "spo2" integer NOT NULL, "attempts" integer NOT NULL, "delivered" integer NOT NULL, "volumeInfusedMl" real NOT NULL, "syringeRemainingMl" real NOT NULL, "note" text NOT NULL DEFAULT (''), "recordedById" integer NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_735ea49e9dbb2193c8ab81b4be8" FOREIGN KEY ("orderId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_df5ee43ba3b15bc1955f7cc97cb" FOREIGN KEY ("releaseId") REFERENCES "syringe_releases" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_eac5fb045549eaf35c5b61a0880" FOREIGN KEY ("recordedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_observations_order_at" ON "observations" ("orderId", "at")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "observations"`);
    await queryRunner.query(`ALTER TABLE "flags" DROP COLUMN "releaseId"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "painNotControlledRatio"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "painNotControlledScore"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "syringeLowThresholdHours"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "spo2Threshold"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "respiratoryRateThreshold"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "observationIntervalMinutes"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "observationIntervalFirst24hMinutes"`);
  }
}
