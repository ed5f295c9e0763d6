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
> &
  Partial<Pick<Observation, 'oxygenLitresPerMinute' | 'oxygenDevice' | 'heartRate' | 'systolicBp' | 'temperatureC' | 'consciousness'>>;

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
    // The vitals recorded, only when recorded.
    ...Object.fromEntries(
      (['oxygenLitresPerMinute', 'oxygenDevice', 'heartRate', 'systolicBp', 'temperatureC', 'consciousness'] as const)
        .filter((key) => observation[key] !== undefined && observation[key] !== null)
        .map((key) => [key, observation[key]]),
    ),
    flagsRaised,
  };
}
