import type { FieldError } from '../api/api-error.schema.js';
import { formatDose } from '../dose/format-dose.js';
import type { OxygenDevice } from './observations-requests.schema.js';

/**
 * The oxygen beside an SpO2 reading, checked as a pair: 0 L/min is air and has no device; above 0 the device
 * must be said (how the oxygen is given changes what the SpO2 means). The server refuses with these errors,
 * the observation form shows them beside the field. Pure.
 */
export function oxygenErrors(reading: { oxygenLitresPerMinute: number; oxygenDevice?: OxygenDevice | null }): FieldError[] {
  const litres = reading.oxygenLitresPerMinute;
  const device = reading.oxygenDevice ?? null;
  if (litres > 0 && device === null)
    return [{ field: 'oxygenDevice', message: `Choose the oxygen device: oxygen is running at ${formatDose(litres, 'L/min')}` }];
  if (litres === 0 && device !== null)
    return [
      { field: 'oxygenDevice', message: 'On air (0 L/min) there is no oxygen device: leave it blank, or enter the litres per minute' },
    ];
  return [];
}
