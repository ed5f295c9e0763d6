import { SEDATION_ACTIONS, type WardPolicy } from '@lockstep/shared';
import { readNumber } from '@/lib/number-input';
import type { ObservationFormValues } from './observation-form';

export type ObservationWarnings = Partial<Record<'sedationLevel' | 'respiratoryRate' | 'spo2', string>>;

/**
 * What saving will raise as urgent, said while the nurse types: the sedation scale's action for
 * 3 and 4, and breathing below the ward's thresholds. Warnings, not errors: the value is saved.
 */
export function observationWarnings(
  values: ObservationFormValues,
  thresholds: Pick<WardPolicy, 'respiratoryRateThreshold' | 'spo2Threshold'> | undefined,
): ObservationWarnings {
  const warnings: ObservationWarnings = {};
  if (values.sedationLevel === '3' || values.sedationLevel === '4') warnings.sedationLevel = SEDATION_ACTIONS[values.sedationLevel];
  if (!thresholds) return warnings;
  const rate = readNumber(values.respiratoryRate);
  if (typeof rate === 'number' && rate < thresholds.respiratoryRateThreshold) {
    warnings.respiratoryRate = `Below the ward’s ${thresholds.respiratoryRateThreshold}/min: saving raises an urgent flag`;
  }
  const spo2 = readNumber(values.spo2);
  if (typeof spo2 === 'number' && spo2 < thresholds.spo2Threshold) {
    warnings.spo2 = `Below the ward’s ${thresholds.spo2Threshold} %: saving raises an urgent flag`;
  }
  return warnings;
}
