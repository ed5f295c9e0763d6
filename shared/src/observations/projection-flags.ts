import { formatDose } from '../dose/format-dose.js';
import { hoursUntilEmpty } from '../dose/hours-until-empty.js';
import type { FlagDraft, ObservationValues } from './observation-flags.js';

// Infused plus remaining can fall short of what the syringe held (the line's priming volume) but
// never exceed it; 1 mL allows for reading the syringe's scale. Lockstep's own tolerance (common
// practice for reading a syringe's graduations), not a published value.
export const SYRINGE_READING_TOLERANCE_ML = 1;

/**
 * A reading that makes the syringe projection impossible: infused plus remaining more than the
 * syringe held, or a time to empty that cannot be worked out (NaN or negative). Review: the
 * nurse checks the syringe and the pump's reading.
 */
export function projectionFlags(
  current: Pick<ObservationValues, 'volumeInfusedMl' | 'syringeRemainingMl'>,
  syringeVolumeMl: number | null,
  basalMlPerHour: number,
  demandMlPerHour: number,
): FlagDraft[] {
  const reasons: string[] = [];
  const sum = current.volumeInfusedMl + current.syringeRemainingMl;
  if (syringeVolumeMl !== null && !(sum <= syringeVolumeMl + SYRINGE_READING_TOLERANCE_ML)) {
    reasons.push(
      `${formatDose(current.volumeInfusedMl, 'mL')} infused and ${formatDose(current.syringeRemainingMl, 'mL')} left is more than the ${formatDose(syringeVolumeMl, 'mL')} syringe`,
    );
  }
  const left = hoursUntilEmpty(current.syringeRemainingMl, basalMlPerHour, demandMlPerHour);
  if (Number.isNaN(left) || left < 0) reasons.push('the time until the syringe is empty cannot be worked out');
  if (reasons.length === 0) return [];
  return [
    {
      severity: 'review',
      code: 'syringe.reading',
      message: `Syringe reading does not add up: ${reasons.join('; ')}`,
      action: 'Check the syringe reading and the pump’s totals, and correct the observation if it was entered wrongly',
    },
  ];
}
