import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Wards, users (with their wards), patients and drugs. */
export class InitialSchema1764650000000 implements MigrationInterface {
  name = 'InitialSchema1764650000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "drugs" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "genericName" varchar(80) NOT NULL, "doseUnit" varchar(8) NOT NULL, CONSTRAINT "UQ_ee02fbf72b7d9bae1fb24c09b13" UNIQUE ("genericName"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "wards" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "code" varchar(16) NOT NULL, "name" varchar(120) NOT NULL, "specialty" varchar(120) NOT NULL, "weightBasedDosing" boolean NOT NULL DEFAULT (0), CONSTRAINT "UQ_24f16d2207b1dcb6ce07d81d20f" UNIQUE ("code"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "patients" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "mrn" varchar(32) NOT NULL, "givenName" varchar(80) NOT NULL, "familyName" varchar(80) NOT NULL, "dateOfBirth" varchar(10) NOT NULL, "sex" varchar(10) NOT NULL, "weightKg" real, "allergies" text NOT NULL DEFAULT (''), "opioidTolerant" boolean NOT NULL DEFAULT (0), "sleepApnoea" boolean NOT NULL DEFAULT (0), "otherSedatives" boolean NOT NULL DEFAULT (0), "wardId" integer NOT NULL, "bed" varchar(16) NOT NULL, CONSTRAINT "UQ_2fe90c44da84b034e30bdadb9d0" UNIQUE ("mrn"), CONSTRAINT "FK_e2c7db64914a7509774c3cae8a1" FOREIGN KEY ("wardId") REFERENCES "wards" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_e2c7db64914a7509774c3cae8a" ON "patients" ("wardId") `);
    await queryRunner.query(
      `CREATE TABLE "users" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "username" varchar(64) NOT NULL, "displayName" varchar(120) NOT NULL, "role" varchar(20) NOT NULL, "passwordHash" varchar(100) NOT NULL, "active" boolean NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "UQ_fe0bb3f6520ee0469504521e710" UNIQUE ("username"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "user_wards" ("userId" integer NOT NULL, "wardId" integer NOT NULL, CONSTRAINT "FK_fe7ecbc8a2e7b4072fc2e18bfa7" FOREIGN KEY ("userId") REFERENCES "users" ("id") ON DELETE CASCADE ON UPDATE CASCADE, CONSTRAINT "FK_adb1743726d1a139e777c2112f5" FOREIGN KEY ("wardId") REFERENCES "wards" ("id") ON DELETE CASCADE ON UPDATE CASCADE, PRIMARY KEY ("userId", "wardId"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_fe7ecbc8a2e7b4072fc2e18bfa" ON "user_wards" ("userId") `);
    await queryRunner.query(`CREATE INDEX "IDX_adb1743726d1a139e777c2112f" ON "user_wards" ("wardId") `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "user_wards"`);
    await queryRunner.query(`DROP TABLE "users"`);
    await queryRunner.query(`DROP TABLE "patients"`);
    await queryRunner.query(`DROP TABLE "wards"`);
    await queryRunner.query(`DROP TABLE "drugs"`);
  }
}
