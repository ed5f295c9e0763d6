import { formatDose } from '../dose/format-dose.js';
import { hoursUntilEmpty } from '../dose/hours-until-empty.js';
import type { FlagSeverity } from '../orders/order.schema.js';
import { ADULT_VITALS_PATIENT, breathingFlags, type VitalSigns, type VitalsPatient } from './breathing-flags.js';
import { type DeliveryRegimen, deliveryFlags } from './delivery-flags.js';
import { painFlags } from './pain-flags.js';
import { projectionFlags } from './projection-flags.js';
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
} & Omit<VitalSigns, 'respiratoryRate' | 'spo2'>;

/** The reading before this one on the same syringe, or the syringe's start (0 delivered, 0 mL infused). */
export type PreviousReading = Pick<ObservationValues, 'at' | 'attempts' | 'delivered' | 'volumeInfusedMl'>;

/** What else the flags need, where the caller knows it. */
export type FlagContext = {
  /** The order's regimen: checks what was delivered against what it allows. */
  regimen?: DeliveryRegimen;
  /** This syringe's earlier readings (its start included) within the last 4 hours, for the 1- and 4-hour limits. */
  earlier?: readonly PreviousReading[];
  /** mL given since the previous reading other than demand doses and basal (clinician boluses). */
  otherMlSincePrevious?: number;
  /** The running syringe's volume: infused plus remaining can never be more. */
  syringeVolumeMl?: number | null;
  /** An urgent sedation or breathing flag is still open on the order. */
  urgentBreathingOpen?: boolean;
  /** The patient's age, ward population and SpO2 scale, for the breathing bands (adult scale 1 when absent). */
  patient?: VitalsPatient;
};

/** The syringe's start as the previous reading, so the first observation's flags have one. */
export function syringeStartReading(startedAt: string): PreviousReading {
  return { at: startedAt, attempts: 0, delivered: 0, volumeInfusedMl: 0 };
}

/** Urgent flags that mean sedation or breathing is a concern: the pain flag then never invites more opioid. */
export function isSedationOrBreathingFlag(code: string): boolean {
  return /^(sedation|respiratory-rate|spo2|news2|consciousness)\b/.test(code);
}

export type FlagDraft = { severity: FlagSeverity; code: string; message: string; action: string };

const MS_PER_HOUR = 3_600_000;

/**
 * The flags one observation raises, from the observation, the one before it (same syringe), the
 * order's basal volume rate and the ward policy. Pure: the caller stores and sends them.
 */
export function observationFlags(
  current: ObservationValues,
  previous: PreviousReading | null,
  basalMlPerHour: number,
  policy: WardPolicy,
  context: FlagContext = {},
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
  flags.push(...breathingFlags(current, context.patient ?? ADULT_VITALS_PATIENT, policy));
  if (previous) {
    const doNotIncrease =
      current.sedationLevel === '3' ||
      current.sedationLevel === '4' ||
      context.urgentBreathingOpen === true ||
      flags.some((flag) => flag.severity === 'urgent' && isSedationOrBreathingFlag(flag.code));
    flags.push(...painFlags(current, previous, policy, doNotIncrease));
    if (context.regimen) {
      flags.push(...deliveryFlags(current, previous, context.earlier ?? [], context.regimen, context.otherMlSincePrevious));
    }
    const hours = (Date.parse(current.at) - Date.parse(previous.at)) / MS_PER_HOUR;
    const usedMl = current.volumeInfusedMl - previous.volumeInfusedMl;
    const demandMlPerHour = hours >= MIN_RATE_WINDOW_HOURS ? Math.max(0, usedMl / hours - basalMlPerHour) : 0;
    const left = hoursUntilEmpty(current.syringeRemainingMl, basalMlPerHour, demandMlPerHour);
    flags.push(...projectionFlags(current, context.syringeVolumeMl ?? null, basalMlPerHour, demandMlPerHour));
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
