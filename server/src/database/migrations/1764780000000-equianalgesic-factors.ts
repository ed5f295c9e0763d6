import { DEFAULT_EQUIANALGESIC_FACTORS } from '@lockstep/shared';
import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Pharmacy's equianalgesic table, keyed by formulary drug id and route, with the shipped defaults
 * (NCI PDQ Cancer Pain, health professional version, equianalgesic table; see shared
 * drugs/equianalgesic.ts) for the formulary's morphine, hydromorphone and fentanyl. Those rows are
 * found by generic name here, once; everything after reads the table by drug id. A database with
 * no drugs yet (a new install) gets its rows when the formulary is written (the demo seed).
 */
export class EquianalgesicFactors1764780000000 implements MigrationInterface {
  name = 'EquianalgesicFactors1764780000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "equianalgesic_factors" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "drugId" integer NOT NULL, "route" varchar(16) NOT NULL, "amount" real NOT NULL, "unit" varchar(8) NOT NULL, "source" text NOT NULL, "changedById" integer, "changedAt" datetime NOT NULL, CONSTRAINT "UQ_equianalgesic_factors_drug_route" UNIQUE ("drugId", "route"), CONSTRAINT "FK_4428456af5f8897ac9fc38b30e8" FOREIGN KEY ("drugId") REFERENCES "drugs" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_0ccfaf39c336246f8f54c0d944a" FOREIGN KEY ("changedById") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    const drugs: { id: number; genericName: string }[] = await queryRunner.query(`SELECT "id", "genericName" FROM "drugs"`);
    const now = new Date().toISOString().replace('T', ' ').slice(0, 23);
    for (const factor of DEFAULT_EQUIANALGESIC_FACTORS) {
      const drug = drugs.find((row) => row.genericName === factor.genericName);
      if (!drug) continue;
      await queryRunner.query(
        `INSERT INTO "equianalgesic_factors" ("drugId", "route", "amount", "unit", "source", "changedById", "changedAt") VALUES (?, ?, ?, ?, ?, NULL, ?)`,
        [drug.id, factor.route, factor.amount, factor.unit, factor.source, now],
      );
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "equianalgesic_factors"`);
  }
}
