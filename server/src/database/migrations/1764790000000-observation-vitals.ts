import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Observations gain oxygen, heart rate, systolic blood pressure, temperature and consciousness, all optional;
 * patients carry their NEWS2 SpO2 scale (1 unless a prescriber chooses 2).
 */
export class ObservationVitals1764790000000 implements MigrationInterface {
  name = 'ObservationVitals1764790000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "oxygenLitresPerMinute" real`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "oxygenDevice" varchar(24)`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "heartRate" integer`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "systolicBp" integer`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "temperatureC" real`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "consciousness" varchar(16)`);
    await queryRunner.query(`ALTER TABLE "patients" ADD COLUMN "spo2Scale" varchar(1) NOT NULL DEFAULT ('1')`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "patients" DROP COLUMN "spo2Scale"`);
    for (const column of ['consciousness', 'temperatureC', 'systolicBp', 'heartRate', 'oxygenDevice', 'oxygenLitresPerMinute'])
      await queryRunner.query(`ALTER TABLE "observations" DROP COLUMN "${column}"`);
  }
}
