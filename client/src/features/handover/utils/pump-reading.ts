import { PUMP_SETTING_FIELDS, PUMP_SETTING_LABELS, type DoseUnit, type PumpSettings } from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';

// The incoming nurse's blind reading of the pump at handover: always starts empty, never filled
// in from the order (that would defeat the re-check). The server compares it with the order.

type PumpReadingField = Exclude<keyof PumpSettings, 'drugId'>;
export type PumpReadingValues = { drugId: string | null } & Record<PumpReadingField, NumberFieldValue>;

export const PUMP_READING_FIELDS: readonly PumpReadingField[] = PUMP_SETTING_FIELDS.filter(
  (field): field is PumpReadingField => field !== 'drugId',
);

/** Settings a pump may have unset: an empty input means "none" and is sent as null. */
export const OPTIONAL_READING_FIELDS: readonly PumpReadingField[] = ['loadingDose', 'oneHourLimit', 'fourHourLimit'];
const POSITIVE_FIELDS: readonly PumpReadingField[] = ['concentrationPerMl', 'syringeVolumeMl'];

export function emptyPumpReading(): PumpReadingValues {
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

/** The unit shown in a reading's label, e.g. 'mg/mL', 'mL', 'min', 'mg/h'. */
export function pumpReadingUnit(field: PumpReadingField, unit: DoseUnit): string {
  if (field === 'concentrationPerMl') return `${unit}/mL`;
  if (field === 'syringeVolumeMl') return 'mL';
  if (field === 'lockoutMinutes') return 'min';
  if (field === 'basalRatePerHour') return `${unit}/h`;
  return unit;
}

/** The reading as the API's settings (empty optional fields as null), or every problem by field. */
export function readPumpReading(values: PumpReadingValues): {
  settings: PumpSettings | null;
  errors: Partial<Record<keyof PumpSettings, string>>;
} {
  const errors: Partial<Record<keyof PumpSettings, string>> = {};
  const drugId = values.drugId ? Number(values.drugId) : NaN;
  if (!Number.isInteger(drugId) || drugId <= 0) errors.drugId = 'Choose the drug';
  const numbers: Partial<Record<PumpReadingField, number | null>> = {};
  for (const field of PUMP_READING_FIELDS) {
    const label = PUMP_SETTING_LABELS[field];
    const value = readNumber(values[field]);
    if (value === undefined) errors[field] = `${label} must be a number`;
    else if (value === null && !OPTIONAL_READING_FIELDS.includes(field))
      errors[field] = field === 'basalRatePerHour' ? 'Enter the basal rate (0 for none)' : `Enter the ${label.toLowerCase()}`;
    else if (value !== null && POSITIVE_FIELDS.includes(field) && value <= 0) errors[field] = `${label} must be more than 0`;
    else numbers[field] = value;
  }
  if (Object.keys(errors).length > 0) return { settings: null, errors };
  const required = (field: PumpReadingField) => numbers[field] as number;
  const optional = (field: PumpReadingField) => numbers[field] ?? null;
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
    errors: {},
  };
}

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
