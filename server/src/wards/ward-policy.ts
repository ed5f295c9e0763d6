import { type WardPolicy, withWardPolicyFloors } from '@lockstep/shared';
import type { Ward } from './entities/ward.entity.js';

/** The ward's stored policy, held at the floors (shared WARD_POLICY_FLOORS) where a stored value is looser. */
export function wardPolicy(ward: Ward): WardPolicy {
  return withWardPolicyFloors({
    observationIntervalFirst24hMinutes: ward.observationIntervalFirst24hMinutes,
    observationIntervalMinutes: ward.observationIntervalMinutes,
    closeObservationIntervalMinutes: ward.closeObservationIntervalMinutes,
    closeObservationPeriodMinutes: ward.closeObservationPeriodMinutes,
    naloxoneClosePeriodMinutes: ward.naloxoneClosePeriodMinutes,
    respiratoryRateThreshold: ward.respiratoryRateThreshold,
    spo2Threshold: ward.spo2Threshold,
    syringeLowThresholdHours: ward.syringeLowThresholdHours,
    reconciliationToleranceMl: ward.reconciliationToleranceMl,
    painNotControlledScore: ward.painNotControlledScore,
    painNotControlledRatio: ward.painNotControlledRatio,
    weightMaxAgeDays: ward.weightMaxAgeDays,
  });
}
