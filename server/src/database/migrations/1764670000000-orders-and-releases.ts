import type { MigrationInterface, QueryRunner } from 'typeorm';

/** PCA orders with their status events, syringe releases, ward and user e-mail addresses, the local mailbox. */
export class OrdersAndReleases1764670000000 implements MigrationInterface {
  name = 'OrdersAndReleases1764670000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "pharmacyEmail" varchar(200) NOT NULL DEFAULT ('')`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "nurseInChargeEmail" varchar(200) NOT NULL DEFAULT ('')`);
    await queryRunner.query(`ALTER TABLE "users" ADD COLUMN "email" varchar(200) NOT NULL DEFAULT ('')`);
    await queryRunner.query(
      `CREATE TABLE "pca_orders" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "patientId" integer NOT NULL, "prescriberId" integer NOT NULL, "drugId" integer NOT NULL, "status" varchar(24) NOT NULL, "regimenType" varchar(16) NOT NULL, "version" integer NOT NULL DEFAULT (1), "supersedesId" integer, "concentrationPerMl" real NOT NULL, "doseUnit" varchar(8) NOT NULL, "loadingDose" real, "demandDose" real NOT NULL, "lockoutMinutes" real NOT NULL, "basalRatePerHour" real NOT NULL, "oneHourLimit" real, "fourHourLimit" real, "clinicianBolusDose" real, "indication" text NOT NULL DEFAULT (''), "reviewDate" varchar(10) NOT NULL, "ruleSnapshot" text, "findingsSnapshot" text NOT NULL, "overrides" text NOT NULL, "signedAt" datetime NOT NULL, "verifiedById" integer, "verifiedAt" datetime, "statusChangedAt" datetime NOT NULL, "statusReason" text, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "rowVersion" integer NOT NULL, CONSTRAINT "FK_b2f2398ac51e9595f57f7f03daa" FOREIGN KEY ("patientId") REFERENCES "patients" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_9abfa5104df5b301806d3883a29" FOREIGN KEY ("prescriberId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_a5e1ba0979cc021f2526893b1ab" FOREIGN KEY ("drugId") REFERENCES "drugs" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_6d3b914135de5157c3febed0c88" FOREIGN KEY ("supersedesId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_07fb5e43cb57a38092bf159a8a2" FOREIGN KEY ("verifiedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_b2f2398ac51e9595f57f7f03da" ON "pca_orders" ("patientId")`);
    await queryRunner.query(`CREATE INDEX "IDX_pca_orders_status" ON "pca_orders" ("status")`);
    await queryRunner.query(
      `CREATE TABLE "order_events" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "orderId" integer NOT NULL, "fromStatus" varchar(24), "toStatus" varchar(24) NOT NULL, "userId" integer NOT NULL, "at" datetime NOT NULL, "reason" text, CONSTRAINT "FK_74f8a596c01980f8e99f503c27b" FOREIGN KEY ("orderId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_742b9dca86792b2785811104abc" FOREIGN KEY ("userId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_74f8a596c01980f8e99f503c27" ON "order_events" ("orderId")`);
    await queryRunner.query(
      `CREATE TABLE "syringe_releases" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "orderId" integer NOT NULL, "releaseCode" varchar(12) NOT NULL, "status" varchar(12) NOT NULL, "concentrationPerMl" real NOT NULL, "volumeMl" real NOT NULL, "batch" varchar(40) NOT NULL, "expiresAt" datetime NOT NULL, "preparedBy" varchar(120) NOT NULL, "checkedBy" varchar(120) NOT NULL, "overrideReason" text, "releasedById" integer NOT NULL, "releasedAt" datetime NOT NULL, "rowVersion" integer NOT NULL, CONSTRAINT "UQ_703f85b07a148e5b55ae39cc90d" UNIQUE ("releaseCode"), CONSTRAINT "FK_f10ef6761648cdd6396a6afb7b8" FOREIGN KEY ("orderId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_253a3d3e37e02aa5960c84e6fa0" FOREIGN KEY ("releasedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_f10ef6761648cdd6396a6afb7b" ON "syringe_releases" ("orderId")`);
    await queryRunner.query(
      `CREATE TABLE "mailbox_messages" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "to" text NOT NULL, "subject" text NOT NULL, "text" text NOT NULL, "at" datetime NOT NULL)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "mailbox_messages"`);
    await queryRunner.query(`DROP TABLE "syringe_releases"`);
    await queryRunner.query(`DROP TABLE "order_events"`);
    await queryRunner.query(`DROP TABLE "pca_orders"`);
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "email"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "nurseInChargeEmail"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "pharmacyEmail"`);
  }
}
