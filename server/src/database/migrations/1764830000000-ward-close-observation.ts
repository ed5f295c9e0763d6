import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Wards store their own close-observation settings: the interval while it runs (15 minutes), how long it
 * lasts after a start or a dose-raising change (60 minutes) and after naloxone (120 minutes). Every ward
 * starts on the shipped defaults (shared DEFAULT_WARD_POLICY), which it already worked to.
 */
export class WardCloseObservation1764830000000 implements MigrationInterface {
  name = 'WardCloseObservation1764830000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "closeObservationIntervalMinutes" integer NOT NULL DEFAULT (15)`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "closeObservationPeriodMinutes" integer NOT NULL DEFAULT (60)`);
    await queryRunner.query(`ALTER TABLE "wards" ADD COLUMN "naloxoneClosePeriodMinutes" integer NOT NULL DEFAULT (120)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const column of ['naloxoneClosePeriodMinutes', 'closeObservationPeriodMinutes', 'closeObservationIntervalMinutes'])
      await queryRunner.query(`ALTER TABLE "wards" DROP COLUMN "${column}"`);
  }
}
