import { PUMP_SETTING_LABELS, type DoseUnit, type Drug, type PumpSettings, type SettingDifference } from '@lockstep/shared';
import { formatPumpSetting } from '@/utils/pump-setting-format';

export interface DifferenceRow {
  field: keyof PumpSettings;
  label: string;
  differs: SettingDifference['differs'];
  /** Whose entry differs from the order, in words: "First check (Kai Mendes)", "Both checks". */
  whose: string;
  first: string;
  second: string;
  ordered: string;
}

export interface CheckNurses {
  first: string;
  second: string;
}

function whoseEntry(differs: SettingDifference['differs'], nurses: CheckNurses): string {
  if (differs === 'both') return `Both checks (${nurses.first} and ${nurses.second})`;
  return differs === 'first' ? `First check (${nurses.first})` : `Second check (${nurses.second})`;
}

/** The settings to correct on the pump, in the pump's field order, each value in safe format. */
export function differenceRows(
  differences: readonly SettingDifference[],
  doseUnit: DoseUnit,
  drugs: readonly Drug[],
  nurses: CheckNurses,
): DifferenceRow[] {
  return differences.map((difference) => ({
    field: difference.field,
    label: PUMP_SETTING_LABELS[difference.field],
    differs: difference.differs,
    whose: whoseEntry(difference.differs, nurses),
    first: formatPumpSetting(difference.field, difference.first, doseUnit, drugs),
    second: formatPumpSetting(difference.field, difference.second, doseUnit, drugs),
    ordered: formatPumpSetting(difference.field, difference.ordered, doseUnit, drugs),
  }));
}
