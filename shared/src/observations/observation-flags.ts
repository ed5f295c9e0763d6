import { formatDose } from '../dose/format-dose.js';
import { hoursUntilEmpty } from '../dose/hours-until-empty.js';
import type { FlagSeverity } from '../orders/order.schema.js';
import { MIN_RATE_WINDOW_HOURS } from './projected-empty-at.js';
import { SEDATION_ACTIONS, type SedationLevel } from './sedation-scale.js';
import type { WardPolicy } from './ward-policy.js';

export type ObservationValues = {
  at: string;
  painScore: number;
  sedationLevel: SedationLevel;
  respiratoryRate: number;
  spo2: number;
  attempts: number;
  delivered: number;
  volumeInfusedMl: number;
  syringeRemainingMl: number;
};

export type FlagDraft = { severity: FlagSeverity; code: string; message: string; action: string };

const MS_PER_HOUR = 3_600_000;

/**
 * The flags one observation raises, from the observation, the one before it (same syringe), the
 * order's basal volume rate and the ward policy. Pure: the caller stores and sends them.
 */
export function observationFlags(
  current: ObservationValues,
  previous: ObservationValues | null,
  basalMlPerHour: number,
  policy: WardPolicy,
): FlagDraft[] {
  const flags: FlagDraft[] = [];
  if (current.sedationLevel === '3' || current.sedationLevel === '4') {
    flags.push({
      severity: 'urgent',
      code: `sedation.${current.sedationLevel}`,
      message: `Sedation level ${current.sedationLevel}`,
      action: SEDATION_ACTIONS[current.sedationLevel],
    });
  }
  if (current.respiratoryRate < policy.respiratoryRateThreshold) {
    flags.push({
      severity: 'urgent',
      code: 'respiratory-rate.low',
      message: `Respiratory rate ${current.respiratoryRate}/min, below ${policy.respiratoryRateThreshold}/min`,
      action: 'Stay with the patient, rouse them, pause the PCA, give oxygen and call for help per protocol; consider naloxone',
    });
  }
  if (current.spo2 < policy.spo2Threshold) {
    flags.push({
      severity: 'urgent',
      code: 'spo2.low',
      message: `SpO2 ${current.spo2} %, below ${policy.spo2Threshold} %`,
      action: 'Stay with the patient, check the airway and oxygen, pause the PCA and call for help per protocol',
    });
  }
  if (previous) {
    const attempts = current.attempts - previous.attempts;
    const delivered = current.delivered - previous.delivered;
    const ratio = delivered > 0 ? attempts / delivered : attempts > 0 ? Infinity : 0;
    if (current.painScore >= policy.painNotControlledScore && ratio >= policy.painNotControlledRatio) {
      flags.push({
        severity: 'review',
        code: 'pain.not-controlled',
        message: `Pain ${current.painScore}/10 with ${attempts} attempts for ${delivered} doses since the last observation`,
        action: 'Review the regimen with the prescriber or pain team; check the line and the pump',
      });
    }
    const hours = (Date.parse(current.at) - Date.parse(previous.at)) / MS_PER_HOUR;
    const usedMl = current.volumeInfusedMl - previous.volumeInfusedMl;
    const demandMlPerHour = hours >= MIN_RATE_WINDOW_HOURS ? Math.max(0, usedMl / hours - basalMlPerHour) : 0;
    const left = hoursUntilEmpty(current.syringeRemainingMl, basalMlPerHour, demandMlPerHour);
    if (left <= policy.syringeLowThresholdHours) {
      const emptyAt = new Date(Date.parse(current.at) + left * MS_PER_HOUR).toISOString();
      flags.push({
        severity: 'review',
        code: 'syringe.low',
        message: `Syringe projected empty in ${formatDose(left, 'h')} (about ${emptyAt.slice(11, 16)} UTC), ${formatDose(current.syringeRemainingMl, 'mL')} left`,
        action: 'Ask pharmacy for the next syringe and plan the syringe change with a second nurse',
      });
    }
  }
  return flags;
}
