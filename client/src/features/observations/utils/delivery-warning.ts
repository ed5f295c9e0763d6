import { deliveryFlags, type DeliveryRegimen, type ObservationResponse, syringeStartReading } from '@lockstep/shared';
import { readNumber } from '@/lib/number-input';
import { pumpBounds, readLocalDateTime, type ObservationFormValues } from './observation-form';

/**
 * "Delivered more than the regimen allows", said while the nurse types the doses delivered, by the
 * shared rule the server flags with: against the reading before (or the first syringe's start).
 * A warning, not an error: the value is saved and the server raises the urgent flag. Nothing is
 * said when the previous reading is not known here (a later syringe's first reading); the server
 * still checks it.
 */
export function deliveryWarning(
  values: ObservationFormValues,
  order: DeliveryRegimen & { releases: readonly { id: number; status: string }[]; startedAt: string | null },
  observations: readonly ObservationResponse[],
  now: Date,
): string | undefined {
  const delivered = readNumber(values.delivered);
  const running = order.releases.find((release) => release.status === 'in_use');
  if (typeof delivered !== 'number' || !running) return undefined;
  const at = readLocalDateTime(values.at.trim()) ?? now;
  const { floor } = pumpBounds(observations, running.id, at);
  const firstSyringe = order.releases.every((release) => release.status !== 'finished');
  const previous = floor ?? (firstSyringe && order.startedAt ? syringeStartReading(order.startedAt) : null);
  if (!previous) return undefined;
  const [flag] = deliveryFlags({ at: at.toISOString(), delivered, volumeInfusedMl: previous.volumeInfusedMl }, previous, [], order).filter(
    (draft) => draft.severity === 'urgent',
  );
  return flag ? `${flag.message}: saving raises an urgent flag` : undefined;
}
