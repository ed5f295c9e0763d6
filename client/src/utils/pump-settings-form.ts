import { PUMP_SETTING_FIELDS, PUMP_SETTING_LABELS, type PumpSettings } from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';

// One nurse's entry of what the pump is programmed with. Every entry starts empty: nothing is
// ever filled in from the order or from the other nurse's entry (that would defeat the check).

export type NumericSettingField = Exclude<keyof PumpSettings, 'drugId'>;

export type PumpSettingsFormValues = { drugId: string | null } & Record<NumericSettingField, NumberFieldValue>;

export const NUMERIC_SETTING_FIELDS: readonly NumericSettingField[] = PUMP_SETTING_FIELDS.filter(
  (field): field is NumericSettingField => field !== 'drugId',
);

/** Settings a pump may have unset: an empty input means "none" and is sent as null. */
export const OPTIONAL_SETTING_FIELDS: readonly NumericSettingField[] = ['loadingDose', 'oneHourLimit', 'fourHourLimit'];

/** Must be more than 0; the rest may be 0 (a basal rate of 0 is a demand-only PCA). */
const POSITIVE_FIELDS: readonly NumericSettingField[] = ['concentrationPerMl', 'syringeVolumeMl'];

export function emptyPumpSettingsForm(): PumpSettingsFormValues {
  return {
    drugId: null,
    concentrationPerMl: '',
    syringeVolumeMl: '',
    loadingDose: '',
    demandDose: '',
    lockoutMinutes: '',
    basalRatePerHour: '',
    oneHourLimit: '',
    fourHourLimit: '',
  };
}

export interface ReadPumpSettings {
  settings: PumpSettings | null;
  /** Problems keyed by the form's field names. */
  errors: Partial<Record<keyof PumpSettings, string>>;
}

function emptyMessage(field: NumericSettingField): string {
  if (field === 'basalRatePerHour') return 'Enter the basal rate (0 for none)';
  return `Enter the ${PUMP_SETTING_LABELS[field].toLowerCase()}`;
}

/** The entry as the API's settings: empty optional fields become null; every problem by field. */
export function readPumpSettingsForm(values: PumpSettingsFormValues): ReadPumpSettings {
  const errors: ReadPumpSettings['errors'] = {};
  const drugId = values.drugId === null || values.drugId === '' ? NaN : Number(values.drugId);
  if (!Number.isInteger(drugId) || drugId <= 0) errors.drugId = 'Choose the drug';

  const numbers: Partial<Record<NumericSettingField, number | null>> = {};
  for (const field of NUMERIC_SETTING_FIELDS) {
    const label = PUMP_SETTING_LABELS[field];
    const value = readNumber(values[field]);
    if (value === undefined) errors[field] = `${label} must be a number`;
    else if (value === null && !OPTIONAL_SETTING_FIELDS.includes(field)) errors[field] = emptyMessage(field);
    else if (value !== null && POSITIVE_FIELDS.includes(field) && value <= 0) errors[field] = `${label} must be more than 0`;
    else numbers[field] = value;
  }
  if (Object.keys(errors).length > 0) return { settings: null, errors };

  const required = (field: NumericSettingField) => numbers[field] as number;
  const optional = (field: NumericSettingField) => numbers[field] ?? null;
  return {
    settings: {
      drugId,
      concentrationPerMl: required('concentrationPerMl'),
      syringeVolumeMl: required('syringeVolumeMl'),
      loadingDose: optional('loadingDose'),
      demandDose: required('demandDose'),
      lockoutMinutes: required('lockoutMinutes'),
      basalRatePerHour: required('basalRatePerHour'),
      oneHourLimit: optional('oneHourLimit'),
      fourHourLimit: optional('fourHourLimit'),
    },
    errors,
  };
}
