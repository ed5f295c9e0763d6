import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Observations gain oxygen, heart rate, systolic blood pressure, temperature and consciousness, all optional. */
export class ObservationVitals1764790000000 implements MigrationInterface {
  name = 'ObservationVitals1764790000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "oxygenLitresPerMinute" real`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "oxygenDevice" varchar(24)`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "heartRate" integer`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "systolicBp" integer`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "temperatureC" real`);
    await queryRunner.query(`ALTER TABLE "observations" ADD COLUMN "consciousness" varchar(16)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const column of ['consciousness', 'temperatureC', 'systolicBp', 'heartRate', 'oxygenDevice', 'oxygenLitresPerMinute'])
      await queryRunner.query(`ALTER TABLE "observations" DROP COLUMN "${column}"`);
  }
}
