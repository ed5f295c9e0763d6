import {
  type Consciousness,
  observationTimelineErrors,
  OXYGEN_REQUIRED_MESSAGE,
  type OxygenDevice,
  pumpTotalsAround,
  SEDATION_LEVELS,
  type CreateObservationRequest,
  type ObservationResponse,
  type SedationLevel,
} from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';

export const NUMBER_FIELDS = [
  'painScore',
  'respiratoryRate',
  'spo2',
  'attempts',
  'delivered',
  'volumeInfusedMl',
  'syringeRemainingMl',
] as const;
/** Vital signs that may be left blank (blank: not recorded; NEWS2 then is not scored). */
export const OPTIONAL_NUMBER_FIELDS = ['oxygenLitresPerMinute', 'heartRate', 'systolicBp', 'temperatureC'] as const;
export type OptionalNumberField = (typeof OPTIONAL_NUMBER_FIELDS)[number];
export type NumberField = (typeof NUMBER_FIELDS)[number] | OptionalNumberField;

const TIMELINE_FIELDS = ['attempts', 'delivered', 'volumeInfusedMl', 'syringeRemainingMl'] as const;
type TimelineField = (typeof TIMELINE_FIELDS)[number];

// A total not typed yet stands in as a value that makes no typed field wrong (attempts unbounded,
// the rest 0), so each total is checked as soon as it is typed; the stand-ins' own errors are dropped.
const NOT_TYPED_YET: Record<TimelineField, number> = { attempts: Infinity, delivered: 0, volumeInfusedMl: 0, syringeRemainingMl: 0 };

/** The form's fields carry the API's names, so a 400's field errors land beside them. */
export type ObservationFormValues = Record<NumberField, NumberFieldValue> & {
  sedationLevel: string;
  /** An OXYGEN_DEVICES value, or empty. */
  oxygenDevice: string;
  /** A CONSCIOUSNESS_LEVELS value, or empty. */
  consciousness: string;
  /** A `datetime-local` value; empty means "now". */
  at: string;
  note: string;
};

export type ObservationFormErrors = Partial<Record<keyof ObservationFormValues, string>>;

export function emptyObservationForm(): ObservationFormValues {
  return {
    painScore: '',
    sedationLevel: '',
    respiratoryRate: '',
    spo2: '',
    attempts: '',
    delivered: '',
    volumeInfusedMl: '',
    syringeRemainingMl: '',
    oxygenLitresPerMinute: '',
    oxygenDevice: '',
    heartRate: '',
    systolicBp: '',
    temperatureC: '',
    consciousness: '',
    at: '',
    note: '',
  };
}

interface NumberRule {
  min: number;
  max: number;
  integer: boolean;
  empty: string;
  notWhole: string;
  below: string;
  above: string;
}

// Plausible ranges, the same as the server's, with the same words.
export const NUMBER_RULES: Record<NumberField, NumberRule> = {
  painScore: {
    min: 0,
    max: 10,
    integer: true,
    empty: 'Enter the pain score',
    notWhole: 'Pain score is a whole number from 0 to 10',
    below: 'Pain score is 0 to 10',
    above: 'Pain score is 0 to 10',
  },
  respiratoryRate: {
    min: 0,
    max: 80,
    integer: true,
    empty: 'Enter the respiratory rate',
    notWhole: 'Respiratory rate is a whole number per minute',
    below: 'Respiratory rate is 0 to 80 per minute',
    above: 'Respiratory rate is 0 to 80 per minute',
  },
  spo2: {
    min: 0,
    max: 100,
    integer: true,
    empty: 'Enter the SpO2',
    notWhole: 'SpO2 is a whole number of %',
    below: 'SpO2 is 0 to 100 %',
    above: 'SpO2 is 0 to 100 %',
  },
  attempts: {
    min: 0,
    max: 100_000,
    integer: true,
    empty: 'Enter the attempts from the pump',
    notWhole: 'Attempts is a whole number from the pump',
    below: 'Attempts cannot be negative',
    above: 'Attempts looks too large: check the pump',
  },
  delivered: {
    min: 0,
    max: 100_000,
    integer: true,
    empty: 'Enter the doses delivered from the pump',
    notWhole: 'Delivered is a whole number from the pump',
    below: 'Delivered cannot be negative',
    above: 'Delivered looks too large: check the pump',
  },
  volumeInfusedMl: {
    min: 0,
    max: 1000,
    integer: false,
    empty: 'Enter the volume infused from the pump',
    notWhole: '',
    below: 'Volume infused cannot be negative',
    above: 'Volume infused looks too large: check the pump',
  },
  syringeRemainingMl: {
    min: 0,
    max: 1000,
    integer: false,
    empty: 'Enter the volume left in the syringe',
    notWhole: '',
    below: 'Syringe remaining cannot be negative',
    above: 'Syringe remaining looks too large: check the syringe',
  },
  oxygenLitresPerMinute: {
    min: 0,
    max: 60,
    integer: false,
    empty: OXYGEN_REQUIRED_MESSAGE,
    notWhole: '',
    below: 'Oxygen is 0 (air) to 60 L/min',
    above: 'Oxygen is 0 (air) to 60 L/min',
  },
  heartRate: {
    min: 0,
    max: 300,
    integer: true,
    empty: 'Enter the heart rate',
    notWhole: 'Heart rate is a whole number per minute',
    below: 'Heart rate is 0 to 300 per minute',
    above: 'Heart rate is 0 to 300 per minute',
  },
  systolicBp: {
    min: 0,
    max: 300,
    integer: true,
    empty: 'Enter the systolic blood pressure',
    notWhole: 'Systolic blood pressure is a whole number of mmHg',
    below: 'Systolic blood pressure is 0 to 300 mmHg',
    above: 'Systolic blood pressure is 0 to 300 mmHg',
  },
  temperatureC: {
    min: 25,
    max: 45,
    integer: false,
    empty: 'Enter the temperature',
    notWhole: '',
    below: 'Temperature is 25 to 45 °C',
    above: 'Temperature is 25 to 45 °C',
  },
};

/** The range check of one number field, as typed. */
export function numberFieldError(field: NumberField, value: NumberFieldValue): string | null {
  const rule = NUMBER_RULES[field];
  const number = readNumber(value);
  if (number === null) return rule.empty;
  if (number === undefined) return `${rule.empty} as a number`;
  if (rule.integer && !Number.isInteger(number)) return rule.notWhole;
  if (number < rule.min) return rule.below;
  if (number > rule.max) return rule.above;
  return null;
}

/** A `datetime-local` value ("2026-03-03T14:05") as a moment in the browser's time zone. */
export function readLocalDateTime(value: string): Date | null {
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2})?$/.test(value)) return null;
  const date = new Date(value);
  return Number.isNaN(date.getTime()) ? null : date;
}

/** The running syringe's observations just before and after `at`: the new pump totals lie between them. */
export function pumpBounds(
  observations: readonly ObservationResponse[],
  releaseId: number | null,
  at: Date,
): { floor: ObservationResponse | null; ceiling: ObservationResponse | null } {
  const { before, after } = pumpTotalsAround(observations, releaseId, at);
  return { floor: before, ceiling: after };
}

export interface ObservationCheckContext {
  observations: readonly ObservationResponse[];
  /** The syringe running now, or null when none is. */
  release: { id: number; volumeMl: number } | null;
  startedAt: string | null;
  now: Date;
}

/** Every problem with the observation as typed, by field; an empty object when it can be saved. */
export function validateObservationForm(values: ObservationFormValues, context: ObservationCheckContext): ObservationFormErrors {
  const errors: ObservationFormErrors = {};
  for (const field of NUMBER_FIELDS) {
    const error = numberFieldError(field, values[field]);
    if (error) errors[field] = error;
  }
  // Optional vitals: blank is "not recorded"; anything typed is checked like the rest.
  for (const field of OPTIONAL_NUMBER_FIELDS) {
    if (readNumber(values[field]) === null) continue;
    const error = numberFieldError(field, values[field]);
    if (error) errors[field] = error;
  }
  // Oxygen is always said beside SpO2 (the server requires it): air is 0.
  if (readNumber(values.oxygenLitresPerMinute) === null) errors.oxygenLitresPerMinute = OXYGEN_REQUIRED_MESSAGE;
  const litres = readNumber(values.oxygenLitresPerMinute);
  if (typeof litres === 'number' && litres > 0 && values.oxygenDevice === '') errors.oxygenDevice = 'Choose the oxygen device';
  if (!(SEDATION_LEVELS as readonly string[]).includes(values.sedationLevel)) errors.sedationLevel = 'Choose the sedation level';

  let at = context.now;
  if (values.at.trim() !== '') {
    const typed = readLocalDateTime(values.at.trim());
    if (!typed) errors.at = 'Enter the date and time of the observation';
    else at = typed;
  }
  // The timeline rules are the server's own (shared).
  if (!errors.at) {
    const typed = new Set<string>(['at']);
    const totals = { ...NOT_TYPED_YET };
    for (const field of TIMELINE_FIELDS) {
      const value = readNumber(values[field]);
      if (typeof value !== 'number') continue;
      totals[field] = value;
      typed.add(field);
    }
    const { floor, ceiling } = pumpBounds(context.observations, context.release?.id ?? null, at);
    const timeline = observationTimelineErrors({
      at,
      values: totals,
      before: floor,
      after: ceiling,
      syringeVolumeMl: context.release?.volumeMl ?? null,
      startedAt: context.startedAt ? new Date(context.startedAt) : null,
      now: context.now,
    });
    for (const { field, message } of timeline) {
      const key = field as keyof ObservationFormValues;
      if (typed.has(field) && !errors[key]) errors[key] = message;
    }
  }
  if (values.note.length > 2000) errors.note = 'The note is at most 2,000 characters';
  return errors;
}

/** The checked form as the API's request: numbers, the time as ISO (left out for "now"), no empty note. */
export function toObservationRequest(values: ObservationFormValues): CreateObservationRequest {
  const number = (field: NumberField) => readNumber(values[field]) as number;
  const at = values.at.trim() === '' ? null : readLocalDateTime(values.at.trim());
  const note = values.note.trim();
  return {
    ...(at ? { at: at.toISOString() } : {}),
    painScore: number('painScore'),
    sedationLevel: values.sedationLevel as SedationLevel,
    respiratoryRate: number('respiratoryRate'),
    spo2: number('spo2'),
    attempts: number('attempts'),
    delivered: number('delivered'),
    volumeInfusedMl: number('volumeInfusedMl'),
    syringeRemainingMl: number('syringeRemainingMl'),
    oxygenLitresPerMinute: number('oxygenLitresPerMinute'),
    ...optionalVitals(values),
    ...(note ? { note } : {}),
  };
}

/** The optional vitals that were typed, as the API takes them. */
function optionalVitals(values: ObservationFormValues): Partial<CreateObservationRequest> {
  const vitals: Partial<CreateObservationRequest> = {};
  for (const field of OPTIONAL_NUMBER_FIELDS) {
    const value = readNumber(values[field]);
    if (typeof value === 'number') vitals[field] = value;
  }
  if (typeof vitals.oxygenLitresPerMinute === 'number' && vitals.oxygenLitresPerMinute > 0 && values.oxygenDevice !== '')
    vitals.oxygenDevice = values.oxygenDevice as OxygenDevice;
  if (values.consciousness !== '') vitals.consciousness = values.consciousness as Consciousness;
  return vitals;
}
