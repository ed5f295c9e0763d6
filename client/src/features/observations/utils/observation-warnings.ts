import { urgentWarnings, type UrgentWarnings, type WardPolicy } from '@lockstep/shared';
import { readNumber } from '@/lib/number-input';
import type { ObservationFormValues } from './observation-form';

/**
 * What saving will raise as urgent, said while the nurse types, by the shared rule that agrees
 * with the flags the server raises. Warnings, not errors: the value is saved.
 */
export function observationWarnings(
  values: ObservationFormValues,
  thresholds: Pick<WardPolicy, 'respiratoryRateThreshold' | 'spo2Threshold'> | undefined,
): UrgentWarnings {
  return urgentWarnings(
    { sedationLevel: values.sedationLevel, respiratoryRate: readNumber(values.respiratoryRate), spo2: readNumber(values.spo2) },
    thresholds,
  );
}
