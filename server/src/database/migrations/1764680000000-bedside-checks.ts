import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Bedside checks, clinician boluses, syringe reconciliations, flags; order start time; ward tolerance. */
export class BedsideChecks1764680000000 implements MigrationInterface {
  name = 'BedsideChecks1764680000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "reconciliationToleranceMl" real NOT NULL DEFAULT (0.5)`);
    await queryRunner.query(`ALTER TABLE "pca_orders" ADD COLUMN "startedAt" datetime`);
    await queryRunner.query(
      `CREATE TABLE "bedside_checks" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "orderId" integer NOT NULL, "releaseId" integer NOT NULL, "status" varchar(16) NOT NULL, "firstNurseId" integer NOT NULL, "firstSettings" text NOT NULL, "firstAt" datetime NOT NULL, "secondNurseId" integer, "secondSettings" text, "secondAt" datetime, "differences" text, "rowVersion" integer NOT NULL, CONSTRAINT "FK_73aa020a7b97b83d52ee884f271" FOREIGN KEY ("orderId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_27ab26bce23207867c7e0c2f4c2" FOREIGN KEY ("releaseId") REFERENCES "syringe_releases" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_ec3596bda226854f98430740406" FOREIGN KEY ("firstNurseId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_a37a0946f5d39c4902669f2f6ca" FOREIGN KEY ("secondNurseId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_73aa020a7b97b83d52ee884f27" ON "bedside_checks" ("orderId")`);
    await queryRunner.query(
      `CREATE TABLE "clinician_boluses" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "orderId" integer NOT NULL, "amount" real NOT NULL, "reason" text NOT NULL, "overrideReason" text, "givenById" integer NOT NULL, "witnessId" integer NOT NULL, "at" datetime NOT NULL, CONSTRAINT "FK_62d68565637dd702674adb0b426" FOREIGN KEY ("orderId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_969f66245bf57f212f4b76547d9" FOREIGN KEY ("givenById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_6ef8797493f7be66ee5a575a3c3" FOREIGN KEY ("witnessId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_62d68565637dd702674adb0b42" ON "clinician_boluses" ("orderId")`);
    await queryRunner.query(
      `CREATE TABLE "release_reconciliations" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "releaseId" integer NOT NULL, "dispensedMl" real NOT NULL, "infusedMl" real NOT NULL, "wastedMl" real NOT NULL, "discrepancyMl" real NOT NULL, "mustReport" boolean NOT NULL, "toleranceMl" real NOT NULL, "recordedById" integer NOT NULL, "witnessId" integer NOT NULL, "at" datetime NOT NULL, CONSTRAINT "UQ_8bcc217286f3953ebc2084c3845" UNIQUE ("releaseId"), CONSTRAINT "REL_8bcc217286f3953ebc2084c384" UNIQUE ("releaseId"), CONSTRAINT "FK_8bcc217286f3953ebc2084c3845" FOREIGN KEY ("releaseId") REFERENCES "syringe_releases" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_1805565a519afe9ddd967e5881a" FOREIGN KEY ("recordedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_7137792fb7f1535499c70485186" FOREIGN KEY ("witnessId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(
      `CREATE TABLE "flags" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "orderId" integer NOT NULL, "severity" varchar(8) NOT NULL, "code" varchar(48) NOT NULL, "message" text NOT NULL, "action" text NOT NULL, "raisedAt" datetime NOT NULL, "acknowledgedAt" datetime, "acknowledgedById" integer, "acknowledgeNote" text, CONSTRAINT "FK_da667510c12e9fd5a549bfda337" FOREIGN KEY ("orderId") REFERENCES "pca_orders" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_129ce9fb3a995bb8fc28c7fd3d9" FOREIGN KEY ("acknowledgedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_da667510c12e9fd5a549bfda33" ON "flags" ("orderId")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "flags"`);
    await queryRunner.query(`DROP TABLE "release_reconciliations"`);
    await queryRunner.query(`DROP TABLE "clinician_boluses"`);
    await queryRunner.query(`DROP TABLE "bedside_checks"`);
    await queryRunner.query(`ALTER TABLE "pca_orders" DROP COLUMN "startedAt"`);
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "reconciliationToleranceMl"`);
  }
}
