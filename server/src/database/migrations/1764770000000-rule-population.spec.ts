import Database from 'better-sqlite3';
import type { QueryRunner } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { RulePopulation1764770000000 } from './1764770000000-rule-population.js';

/** The tables the migration reads, as the earlier migrations leave them (only the columns it needs where it adds to a table). */
function databaseBefore() {
  const db = new Database(':memory:');
  db.exec(`CREATE TABLE "wards" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "code" varchar(16) NOT NULL)`);
  db.exec(`CREATE TABLE "drugs" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL)`);
  db.exec(`CREATE TABLE "library_versions" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL)`);
  db.exec(
    `CREATE TABLE "limit_rules" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "versionId" integer NOT NULL, "drugId" integer NOT NULL, "concentrationPerMl" real NOT NULL, "doseUnit" varchar(8) NOT NULL, "perKg" boolean NOT NULL DEFAULT (0), "limits" text NOT NULL, CONSTRAINT "UQ_limit_rules_version_drug_concentration" UNIQUE ("versionId", "drugId", "concentrationPerMl"))`,
  );
  db.exec(`CREATE INDEX "IDX_2bc3972a1c4cc864047cdb91c0" ON "limit_rules" ("versionId") `);
  db.exec(`CREATE TABLE "pca_orders" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "ruleSnapshot" text)`);
  db.exec(`INSERT INTO "wards" ("code") VALUES ('WRE')`);
  db.exec(`INSERT INTO "drugs" ("id") VALUES (1)`);
  db.exec(`INSERT INTO "library_versions" ("id") VALUES (1), (2)`);
  const rule = db.prepare(
    `INSERT INTO "limit_rules" ("versionId", "drugId", "concentrationPerMl", "doseUnit", "perKg", "limits") VALUES (?, ?, ?, ?, ?, ?)`,
  );
  rule.run(1, 1, 1, 'mg', 0, '{"demandDose":{"hardMax":3}}');
  rule.run(2, 1, 1, 'mg', 1, '{"demandDose":{"hardMax":0.03}}');
  const order = db.prepare(`INSERT INTO "pca_orders" ("ruleSnapshot") VALUES (?)`);
  order.run(JSON.stringify({ id: 1, drugId: 1, perKg: false, limits: {} }));
  order.run(JSON.stringify({ id: 2, drugId: 1, perKg: true, limits: {} }));
  order.run(null);
  return db;
}

const runner = (db: Database.Database) =>
  ({
    query: async (sql: string) => {
      db.exec(sql);
    },
  }) as unknown as QueryRunner;

describe('migration 1764770000000: rule populations', () => {
  it('makes per-kg rules paediatric under 18 and the others adult, in the rules and in signed orders’ copies', async () => {
    const db = databaseBefore();
    await new RulePopulation1764770000000().up(runner(db));
    expect(
      db.prepare(`SELECT "perKg", "population", "minAgeYears", "maxAgeYears", "populationKey" FROM "limit_rules" ORDER BY "id"`).all(),
    ).toEqual([
      { perKg: 0, population: 'adult', minAgeYears: null, maxAgeYears: null, populationKey: 'adult' },
      { perKg: 1, population: 'paediatric', minAgeYears: null, maxAgeYears: 18, populationKey: 'paediatric:-18:-' },
    ]);
    const snapshots = db.prepare(`SELECT "ruleSnapshot" FROM "pca_orders" ORDER BY "id"`).all() as { ruleSnapshot: string | null }[];
    expect(snapshots.map((row) => (row.ruleSnapshot === null ? null : JSON.parse(row.ruleSnapshot)))).toEqual([
      {
        id: 1,
        drugId: 1,
        perKg: false,
        limits: {},
        population: 'adult',
        minAgeYears: null,
        maxAgeYears: null,
        minWeightKg: null,
        maxWeightKg: null,
      },
      {
        id: 2,
        drugId: 1,
        perKg: true,
        limits: {},
        population: 'paediatric',
        minAgeYears: null,
        maxAgeYears: 18,
        minWeightKg: null,
        maxWeightKg: null,
      },
      null,
    ]);
    expect(db.prepare(`SELECT "weightMaxAgeDays" FROM "wards"`).all()).toEqual([{ weightMaxAgeDays: 7 }]);
    // The database now refuses a second rule for one population, and takes an adult and a paediatric one.
    const insert = db.prepare(
      `INSERT INTO "limit_rules" ("versionId", "drugId", "concentrationPerMl", "doseUnit", "perKg", "limits", "population", "populationKey") VALUES (1, 1, 1, 'mg', 1, '{}', ?, ?)`,
    );
    expect(() => insert.run('adult', 'adult')).toThrow(/UNIQUE/);
    insert.run('paediatric', 'paediatric:1-18:10-');
  });

  it('goes back down to one rule per drug and concentration', async () => {
    const db = databaseBefore();
    const migration = new RulePopulation1764770000000();
    await migration.up(runner(db));
    await migration.down(runner(db));
    expect(db.prepare(`SELECT "versionId", "perKg" FROM "limit_rules" ORDER BY "id"`).all()).toEqual([
      { versionId: 1, perKg: 0 },
      { versionId: 2, perKg: 1 },
    ]);
  });
});
