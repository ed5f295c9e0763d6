import { WARD_POLICY_FLOORS } from '@lockstep/shared';
import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Ward policies saved before the floors existed (shared WARD_POLICY_FLOORS: urgent at RR <= 8 and
 * SpO2 <= 91 %, NEWS2, Royal College of Physicians 2017; intervals at most hourly in the first 24 hours
 * and two-hourly after, common practice) are raised to them, so a stored value is never looser than
 * what the ward works to. The down migration leaves them: a stricter policy is safe.
 */
export class WardPolicySignOff1764810000000 implements MigrationInterface {
  name = 'WardPolicySignOff1764810000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const floors = WARD_POLICY_FLOORS;
    await queryRunner.query(
      `UPDATE "wards" SET "respiratoryRateThreshold" = MAX("respiratoryRateThreshold", ?), "spo2Threshold" = MAX("spo2Threshold", ?), ` +
        `"observationIntervalFirst24hMinutes" = MIN("observationIntervalFirst24hMinutes", ?), "observationIntervalMinutes" = MIN("observationIntervalMinutes", ?)`,
      [
        floors.respiratoryRateThreshold.min,
        floors.spo2Threshold.min,
        floors.observationIntervalFirst24hMinutes.max,
        floors.observationIntervalMinutes.max,
      ],
    );
  }

  async down(): Promise<void> {
    // Nothing to undo: the raised values are a stricter policy.
  }
}
