import type { Observation } from './entities/observation.entity.js';

type Recorded = Pick<
  Observation,
  | 'id'
  | 'at'
  | 'painScore'
  | 'sedationLevel'
  | 'respiratoryRate'
  | 'spo2'
  | 'attempts'
  | 'delivered'
  | 'volumeInfusedMl'
  | 'syringeRemainingMl'
>;

/** What the audit trail keeps of an observation: every value and the flags it raised. */
export function observationAuditSummary(observation: Recorded, flagsRaised: string[]): Record<string, unknown> {
  const { id, at, painScore, sedationLevel, respiratoryRate, spo2, attempts, delivered, volumeInfusedMl, syringeRemainingMl } = observation;
  return {
    observationId: id,
    at,
    painScore,
    sedationLevel,
    respiratoryRate,
    spo2,
    attempts,
    delivered,
    volumeInfusedMl,
    syringeRemainingMl,
    flagsRaised,
  };
}
