import Database from 'better-sqlite3';
import type { QueryRunner } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { WardPopulation1764840000000 } from './1764840000000-ward-population.js';

const runner = (db: Database.Database) =>
  ({
    query: async (sql: string) => {
      db.exec(sql);
    },
  }) as unknown as QueryRunner;

describe('migration 1764840000000: ward population', () => {
  it('makes wards with weight-based dosing paediatric and the others adult, leaving weight-based dosing as it was', async () => {
    const db = new Database(':memory:');
    db.exec(
      `CREATE TABLE "wards" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "code" varchar(16) NOT NULL, "weightBasedDosing" boolean NOT NULL DEFAULT (0))`,
    );
    db.exec(`INSERT INTO "wards" ("code", "weightBasedDosing") VALUES ('HAR', 0), ('WRE', 1)`);
    await new WardPopulation1764840000000().up(runner(db));
    expect(db.prepare(`SELECT "code", "weightBasedDosing", "population" FROM "wards" ORDER BY "id"`).all()).toEqual([
      { code: 'HAR', weightBasedDosing: 0, population: 'adult' },
      { code: 'WRE', weightBasedDosing: 1, population: 'paediatric' },
    ]);
    db.exec(`INSERT INTO "wards" ("code") VALUES ('NEW')`);
    expect(db.prepare(`SELECT "population" FROM "wards" WHERE "code" = 'NEW'`).get()).toEqual({ population: 'adult' });
    await new WardPopulation1764840000000().down(runner(db));
    expect(db.prepare(`SELECT * FROM "wards" ORDER BY "id"`).all()).toEqual([
      { id: 1, code: 'HAR', weightBasedDosing: 0 },
      { id: 2, code: 'WRE', weightBasedDosing: 1 },
      { id: 3, code: 'NEW', weightBasedDosing: 0 },
    ]);
  });
});
