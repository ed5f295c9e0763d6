import type { MigrationInterface, QueryRunner } from 'typeorm';

const LIMIT_RULES_WITH_POPULATION = `CREATE TABLE "temporary_limit_rules" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "versionId" integer NOT NULL, "drugId" integer NOT NULL, "concentrationPerMl" real NOT NULL, "doseUnit" varchar(8) NOT NULL, "perKg" boolean NOT NULL DEFAULT (0), "limits" text NOT NULL, "population" varchar(12) NOT NULL DEFAULT ('adult'), "minAgeYears" real, "maxAgeYears" real, "minWeightKg" real, "maxWeightKg" real, "populationKey" varchar(80) NOT NULL DEFAULT ('adult'), CONSTRAINT "UQ_limit_rules_version_drug_concentration_population" UNIQUE ("versionId", "drugId", "concentrationPerMl", "populationKey"), CONSTRAINT "FK_45b8c7c34bd565370e095789ffc" FOREIGN KEY ("drugId") REFERENCES "drugs" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_2bc3972a1c4cc864047cdb91c09" FOREIGN KEY ("versionId") REFERENCES "library_versions" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`;

const LIMIT_RULES_WITHOUT_POPULATION = `CREATE TABLE "temporary_limit_rules" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "versionId" integer NOT NULL, "drugId" integer NOT NULL, "concentrationPerMl" real NOT NULL, "doseUnit" varchar(8) NOT NULL, "perKg" boolean NOT NULL DEFAULT (0), "limits" text NOT NULL, CONSTRAINT "UQ_limit_rules_version_drug_concentration" UNIQUE ("versionId", "drugId", "concentrationPerMl"), CONSTRAINT "FK_45b8c7c34bd565370e095789ffc" FOREIGN KEY ("drugId") REFERENCES "drugs" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_2bc3972a1c4cc864047cdb91c09" FOREIGN KEY ("versionId") REFERENCES "library_versions" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`;

/**
 * Limit rules carry the population they are for (adult, or paediatric with age and weight bands)
 * and the unique key becomes version + drug + concentration + population (SQLite needs a table
 * rebuild for a new constraint). Existing rules: per-kg rules were the children's wards' rules, so
 * they become paediatric for ages under 18 with no weight band; every other rule becomes adult.
 * Per-kg rules written before ceilings existed have none: the order check says so (a caution) until
 * pharmacy saves a version with ceilings. Wards get weightMaxAgeDays (default 7 days, common practice).
 */
export class RulePopulation1764770000000 implements MigrationInterface {
  name = 'RulePopulation1764770000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX "IDX_2bc3972a1c4cc864047cdb91c0"`);
    await queryRunner.query(LIMIT_RULES_WITH_POPULATION);
    await queryRunner.query(
      `INSERT INTO "temporary_limit_rules"("id", "versionId", "drugId", "concentrationPerMl", "doseUnit", "perKg", "limits", "population", "maxAgeYears", "populationKey") ` +
        `SELECT "id", "versionId", "drugId", "concentrationPerMl", "doseUnit", "perKg", "limits", ` +
        `CASE WHEN "perKg" THEN 'paediatric' ELSE 'adult' END, CASE WHEN "perKg" THEN 18 ELSE NULL END, ` +
        `CASE WHEN "perKg" THEN 'paediatric:-18:-' ELSE 'adult' END FROM "limit_rules"`,
    );
    await queryRunner.query(`DROP TABLE "limit_rules"`);
    await queryRunner.query(`ALTER TABLE "temporary_limit_rules" RENAME TO "limit_rules"`);
    await queryRunner.query(`CREATE INDEX "IDX_2bc3972a1c4cc864047cdb91c0" ON "limit_rules" ("versionId") `);
    // Signed orders keep the rule they were checked against: give those copies the same population.
    await queryRunner.query(
      `UPDATE "pca_orders" SET "ruleSnapshot" = json_set("ruleSnapshot", ` +
        `'$.population', CASE WHEN json_extract("ruleSnapshot", '$.perKg') THEN 'paediatric' ELSE 'adult' END, ` +
        `'$.minAgeYears', NULL, '$.maxAgeYears', CASE WHEN json_extract("ruleSnapshot", '$.perKg') THEN 18 ELSE NULL END, ` +
        `'$.minWeightKg', NULL, '$.maxWeightKg', NULL) WHERE json_type("ruleSnapshot") = 'object'`,
    );
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "weightMaxAgeDays" integer NOT NULL DEFAULT (7)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "weightMaxAgeDays"`);
    await queryRunner.query(`DROP INDEX "IDX_2bc3972a1c4cc864047cdb91c0"`);
    // Going back, only one rule per drug and concentration fits: the adult rule where there is one.
    await queryRunner.query(
      `DELETE FROM "limit_rules" WHERE "population" = 'paediatric' AND EXISTS (SELECT 1 FROM "limit_rules" "other" WHERE "other"."versionId" = "limit_rules"."versionId" AND "other"."drugId" = "limit_rules"."drugId" AND "other"."concentrationPerMl" = "limit_rules"."concentrationPerMl" AND "other"."id" <> "limit_rules"."id" AND ("other"."population" = 'adult' OR "other"."id" < "limit_rules"."id"))`,
    );
    await queryRunner.query(LIMIT_RULES_WITHOUT_POPULATION);
    await queryRunner.query(
      `INSERT INTO "temporary_limit_rules"("id", "versionId", "drugId", "concentrationPerMl", "doseUnit", "perKg", "limits") SELECT "id", "versionId", "drugId", "concentrationPerMl", "doseUnit", "perKg", "limits" FROM "limit_rules"`,
    );
    await queryRunner.query(`DROP TABLE "limit_rules"`);
    await queryRunner.query(`ALTER TABLE "temporary_limit_rules" RENAME TO "limit_rules"`);
    await queryRunner.query(`CREATE INDEX "IDX_2bc3972a1c4cc864047cdb91c0" ON "limit_rules" ("versionId") `);
  }
}
