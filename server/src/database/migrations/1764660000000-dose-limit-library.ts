import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Dose-limit library versions per ward and their limit rules. */
export class DoseLimitLibrary1764660000000 implements MigrationInterface {
  name = 'DoseLimitLibrary1764660000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "library_versions" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "wardId" integer NOT NULL, "number" integer NOT NULL, "status" varchar(20) NOT NULL, "note" text NOT NULL DEFAULT (''), "authorId" integer NOT NULL, "approverId" integer, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "submittedAt" datetime, "approvedAt" datetime, "retiredAt" datetime, CONSTRAINT "UQ_library_versions_ward_number" UNIQUE ("wardId", "number"), CONSTRAINT "FK_74c767292f445b351f6fa4f1270" FOREIGN KEY ("wardId") REFERENCES "wards" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_baae2d251c09070ac90d67a3ae0" FOREIGN KEY ("authorId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_3f66c9c72acd7ed733ee0e96b90" FOREIGN KEY ("approverId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    // The database itself refuses a second active, or a second open, version for one ward.
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_library_versions_one_open" ON "library_versions" ("wardId") WHERE "status" IN ('draft', 'pending_approval')`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_library_versions_one_active" ON "library_versions" ("wardId") WHERE "status" = 'active'`,
    );
    await queryRunner.query(
      `CREATE TABLE "limit_rules" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "versionId" integer NOT NULL, "drugId" integer NOT NULL, "concentrationPerMl" real NOT NULL, "doseUnit" varchar(8) NOT NULL, "perKg" boolean NOT NULL DEFAULT (0), "limits" text NOT NULL, CONSTRAINT "UQ_limit_rules_version_drug_concentration" UNIQUE ("versionId", "drugId", "concentrationPerMl"), CONSTRAINT "FK_2bc3972a1c4cc864047cdb91c09" FOREIGN KEY ("versionId") REFERENCES "library_versions" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_45b8c7c34bd565370e095789ffc" FOREIGN KEY ("drugId") REFERENCES "drugs" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_2bc3972a1c4cc864047cdb91c0" ON "limit_rules" ("versionId") `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "limit_rules"`);
    await queryRunner.query(`DROP TABLE "library_versions"`);
  }
}
