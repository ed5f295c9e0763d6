import type { WardPolicy } from '@lockstep/shared';
import type { Ward } from './entities/ward.entity.js';

export function wardPolicy(ward: Ward): WardPolicy {
  return {
    observationIntervalFirst24hMinutes: ward.observationIntervalFirst24hMinutes,
    observationIntervalMinutes: ward.observationIntervalMinutes,
    respiratoryRateThreshold: ward.respiratoryRateThreshold,
    spo2Threshold: ward.spo2Threshold,
    syringeLowThresholdHours: ward.syringeLowThresholdHours,
    reconciliationToleranceMl: ward.reconciliationToleranceMl,
    painNotControlledScore: ward.painNotControlledScore,
    painNotControlledRatio: ward.painNotControlledRatio,
    weightMaxAgeDays: ward.weightMaxAgeDays,
  };
}
