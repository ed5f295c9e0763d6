import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Wards carry the population they care for, 'adult' or 'paediatric': a paediatric ward's observations are
 * judged by the children's bands. Until now a ward with weight-based dosing stood for a children's ward, so
 * those wards become paediatric and the rest adult. Weight-based dosing stays as it was: it is how doses
 * are checked, a separate fact.
 */
export class WardPopulation1764840000000 implements MigrationInterface {
  name = 'WardPopulation1764840000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "population" varchar(12) NOT NULL DEFAULT ('adult')`);
    await queryRunner.query(`UPDATE "wards" SET "population" = CASE WHEN "weightBasedDosing" THEN 'paediatric' ELSE 'adult' END`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "population"`);
  }
}
