import type { SedationLevel } from './sedation-scale.js';
import { SEDATION_ACTIONS } from './sedation-scale.js';
import type { WardPolicy } from './ward-policy.js';

export type UrgentWarnings = Partial<Record<'sedationLevel' | 'respiratoryRate' | 'spo2', string>>;

/**
 * What saving an observation will raise as urgent, said while the nurse types: the sedation
 * scale's action for 3 and 4, and breathing below the ward's thresholds (the same comparisons as
 * `observationFlags`). Warnings, not errors: the value is saved. Unknown values warn of nothing.
 */
export function urgentWarnings(
  values: { sedationLevel?: SedationLevel | string | null; respiratoryRate?: number | null; spo2?: number | null },
  thresholds: Pick<WardPolicy, 'respiratoryRateThreshold' | 'spo2Threshold'> | undefined,
): UrgentWarnings {
  const warnings: UrgentWarnings = {};
  if (values.sedationLevel === '3' || values.sedationLevel === '4') warnings.sedationLevel = SEDATION_ACTIONS[values.sedationLevel];
  if (!thresholds) return warnings;
  const { respiratoryRate, spo2 } = values;
  if (typeof respiratoryRate === 'number' && respiratoryRate < thresholds.respiratoryRateThreshold) {
    warnings.respiratoryRate = `Below the ward’s ${thresholds.respiratoryRateThreshold}/min: saving raises an urgent flag`;
  }
  if (typeof spo2 === 'number' && spo2 < thresholds.spo2Threshold) {
    warnings.spo2 = `Below the ward’s ${thresholds.spo2Threshold} %: saving raises an urgent flag`;
  }
  return warnings;
}
