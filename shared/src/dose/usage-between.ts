import { withoutFloatNoise } from './float-noise.js';
import type { PumpReading } from './types.js';
import { MS_PER_HOUR } from './units.js';

export type Usage = {
  attempts: number;
  delivered: number;
  /** attempts ÷ delivered; null when nothing was delivered. */
  ratio: number | null;
  volumeMl: number;
  hours: number;
};

// A counter that went backwards (pump reset, new syringe) or an unreadable time gives no usable
// difference: NaN, which formatDose shows as "—", rather than a negative use.
function increase(earlier: number, later: number): number {
  const difference = withoutFloatNoise(later - earlier);
  return Number.isFinite(difference) && difference >= 0 ? difference : Number.NaN;
}

/**
 * Pump use between two cumulative readings of the same syringe: attempts, delivered doses, their
 * ratio, volume infused and hours elapsed. Dose = volumeToDose(volumeMl, concentration).
 */
export function usageBetween(a: PumpReading, b: PumpReading): Usage {
  const attempts = increase(a.attempts, b.attempts);
  const delivered = increase(a.delivered, b.delivered);
  const hours = withoutFloatNoise(increase(Date.parse(a.at), Date.parse(b.at)) / MS_PER_HOUR);
  return {
    attempts,
    delivered,
    ratio: delivered > 0 ? withoutFloatNoise(attempts / delivered) : null,
    volumeMl: increase(a.volumeInfusedMl, b.volumeInfusedMl),
    hours,
  };
}
