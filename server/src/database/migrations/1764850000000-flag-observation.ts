import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A flag remembers the observation that raised it, so the monitoring schedule counts from the reading's time. */
export class FlagObservation1764850000000 implements MigrationInterface {
  name = 'FlagObservation1764850000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "flags" ADD COLUMN "observationId" integer`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "flags" DROP COLUMN "observationId"`);
  }
}
