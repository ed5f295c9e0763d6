import {
  emptyPumpSettingsForm,
  NUMERIC_SETTING_FIELDS,
  OPTIONAL_SETTING_FIELDS,
  readPumpSettingsForm,
  type NumericSettingField,
  type PumpSettingsFormValues,
} from '@/utils/pump-settings-form';
import { pumpSettingUnit } from '@/utils/pump-setting-format';

// The incoming nurse's blind reading of the pump at handover: always starts empty, never filled
// in from the order (that would defeat the re-check). The server compares it with the order. It is
// the bedside check's entry, read by the same functions.

export type PumpReadingValues = PumpSettingsFormValues;
export const PUMP_READING_FIELDS: readonly NumericSettingField[] = NUMERIC_SETTING_FIELDS;
export const OPTIONAL_READING_FIELDS: readonly NumericSettingField[] = OPTIONAL_SETTING_FIELDS;
export const emptyPumpReading = emptyPumpSettingsForm;
export const readPumpReading = readPumpSettingsForm;
export const pumpReadingUnit = pumpSettingUnit;

/** The server's field errors (`settings.demandDose`, `signature.password`) on the modal's flat form. */
export function signoffFormErrors(errors: readonly { field: string; message: string }[]): {
  fieldErrors: Record<string, string>;
  other: string[];
} {
  const fieldErrors: Record<string, string> = {};
  const other: string[] = [];
  for (const { field, message } of errors) {
    const target =
      field === 'signature.password' || field === 'signature' ? 'password' : field.startsWith('settings.') ? field.slice(9) : null;
    if (target && (target === 'password' || target === 'drugId' || (PUMP_READING_FIELDS as readonly string[]).includes(target)))
      fieldErrors[target] ??= message;
    else other.push(message);
  }
  return { fieldErrors, other };
}
