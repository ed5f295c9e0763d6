import { news2NotScoredReason, news2Of, type ObservationResponse, type VitalSigns, type VitalsPatient } from '@lockstep/shared';
import type { Observation } from '../entities/observation.entity.js';

/** Expects `recordedBy` loaded; `patient` says which bands and whether NEWS2 applies. */
export function toObservationResponse(observation: Observation, patient: VitalsPatient): ObservationResponse {
  const vitals: VitalSigns = {
    respiratoryRate: observation.respiratoryRate,
    spo2: observation.spo2,
    oxygenLitresPerMinute: observation.oxygenLitresPerMinute,
    heartRate: observation.heartRate,
    systolicBp: observation.systolicBp,
    temperatureC: observation.temperatureC,
    consciousness: observation.consciousness,
  };
  return {
    id: observation.id,
    orderId: observation.orderId,
    releaseId: observation.releaseId,
    at: observation.at.toISOString(),
    painScore: observation.painScore,
    sedationLevel: observation.sedationLevel,
    respiratoryRate: observation.respiratoryRate,
    spo2: observation.spo2,
    attempts: observation.attempts,
    delivered: observation.delivered,
    volumeInfusedMl: observation.volumeInfusedMl,
    syringeRemainingMl: observation.syringeRemainingMl,
    oxygenLitresPerMinute: observation.oxygenLitresPerMinute ?? null,
    oxygenDevice: observation.oxygenDevice ?? null,
    heartRate: observation.heartRate ?? null,
    systolicBp: observation.systolicBp ?? null,
    temperatureC: observation.temperatureC ?? null,
    consciousness: observation.consciousness ?? null,
    news2: news2Of(vitals, patient),
    news2NotScored: news2NotScoredReason(vitals, patient),
    note: observation.note,
    recordedByName: observation.recordedBy.displayName,
  };
}
