import type { ObservationResponse } from '@lockstep/shared';
import type { Observation } from '../entities/observation.entity.js';

/** Expects `recordedBy` loaded. */
export function toObservationResponse(observation: Observation): ObservationResponse {
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
    note: observation.note,
    recordedByName: observation.recordedBy.displayName,
  };
}
