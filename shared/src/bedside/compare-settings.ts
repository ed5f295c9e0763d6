import { PUMP_SETTING_FIELDS, type PumpSettings, type SettingDifference } from './bedside.schema.js';

// Values are typed by people from a pump display; compare decimals with a tolerance, not bit for bit.
// 1e-9 is far below any pump's resolution: Lockstep's own, not a clinical value.
const TOLERANCE = 1e-9;

function same(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) <= TOLERANCE;
}

/**
 * The independent double-check: both entries must equal the verified order in every field.
 * Each difference says whose entry was wrong, so the pair know what to correct on the pump.
 */
export function compareSettings(first: PumpSettings, second: PumpSettings, ordered: PumpSettings): SettingDifference[] {
  const differences: SettingDifference[] = [];
  for (const field of PUMP_SETTING_FIELDS) {
    const firstOk = same(first[field], ordered[field]);
    const secondOk = same(second[field], ordered[field]);
    if (firstOk && secondOk) continue;
    differences.push({
      field,
      first: first[field],
      second: second[field],
      ordered: ordered[field],
      differs: !firstOk && !secondOk ? 'both' : firstOk ? 'second' : 'first',
    });
  }
  return differences;
}
