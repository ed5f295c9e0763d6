import {
  addAllergySchema,
  meetsOpioidTolerance,
  opioidToleranceSchema,
  recordWeightSchema,
  toleranceClaimProblem,
  weightDateProblem,
  type AddAllergyRequest,
  type AllergySeverity,
  type OpioidToleranceRequest,
  type Patient,
  type RecordWeightRequest,
} from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';

type Errors<T> = Partial<Record<keyof T, string>>;

/** The shared request schema's first message per field, as the server would answer it. */
function schemaErrors<T>(
  schema: typeof addAllergySchema | typeof opioidToleranceSchema | typeof recordWeightSchema,
  candidate: unknown,
): Errors<T> {
  const parsed = schema.safeParse(candidate);
  const errors: Errors<T> = {};
  if (!parsed.success) for (const issue of parsed.error.issues) errors[String(issue.path[0]) as keyof T] ??= issue.message;
  return errors;
}

/** A typed number for the request: '' is left out (the schema says it is missing), half-typed text is NaN (refused). */
const typed = (value: NumberFieldValue) => {
  const number = readNumber(value);
  return number === null ? undefined : (number ?? Number.NaN);
};

/** The select's value for a substance typed as free text. */
export const FREE_TEXT_SUBSTANCE = 'other';

/** `drug` is a formulary drug id as text (the select's value), or `FREE_TEXT_SUBSTANCE` for a substance typed as free text. */
export interface AllergyFormValues {
  drug: string;
  substance: string;
  reaction: string;
  severity: AllergySeverity | '';
}

export const EMPTY_ALLERGY_FORM: AllergyFormValues = { drug: FREE_TEXT_SUBSTANCE, substance: '', reaction: '', severity: '' };

/** The request: a picked drug's entry takes the drug's generic name as its substance. */
export function allergyRequest(values: AllergyFormValues, drugNames: ReadonlyMap<number, string>): AddAllergyRequest {
  const drugId = values.drug === FREE_TEXT_SUBSTANCE || values.drug === '' ? null : Number(values.drug);
  const substance = drugId === null ? values.substance : (drugNames.get(drugId) ?? values.substance);
  return { drugId, substance, reaction: values.reaction, severity: values.severity as AllergySeverity };
}

export function allergyFormErrors(values: AllergyFormValues, drugNames: ReadonlyMap<number, string>): Errors<AllergyFormValues> {
  const errors = schemaErrors<AllergyFormValues & AddAllergyRequest>(addAllergySchema, {
    ...allergyRequest(values, drugNames),
    severity: values.severity || undefined,
  });
  const { drugId, ...rest } = errors;
  return { ...rest, ...(drugId ? { drug: drugId } : {}) };
}

export interface ToleranceFormValues {
  oralMorphineMgPerDay: NumberFieldValue;
  days: NumberFieldValue;
}

export function toleranceFormValues(patient: Patient): ToleranceFormValues {
  return { oralMorphineMgPerDay: patient.toleranceOralMorphineMgPerDay ?? '', days: patient.toleranceDays ?? '' };
}

/** The request: tolerant exactly when the basis meets the definition, so the claim can never disagree with it. */
export function toleranceRequest(values: ToleranceFormValues): OpioidToleranceRequest {
  const mg = readNumber(values.oralMorphineMgPerDay);
  const days = readNumber(values.days);
  const basis = { oralMorphineMgPerDay: mg ?? (mg === null ? null : Number.NaN), days: days ?? (days === null ? null : Number.NaN) };
  return { opioidTolerant: meetsOpioidTolerance(basis), ...basis };
}

export function toleranceFormErrors(values: ToleranceFormValues): Errors<ToleranceFormValues> {
  const request = toleranceRequest(values);
  const errors = schemaErrors<ToleranceFormValues>(opioidToleranceSchema, request);
  if (Object.keys(errors).length > 0) return errors;
  const problem = toleranceClaimProblem(request.opioidTolerant, request);
  return problem && problem.field !== 'opioidTolerant' ? { [problem.field]: problem.message } : {};
}

export interface WeightFormValues {
  weightKg: NumberFieldValue;
  measuredOn: string;
}

export function weightRequest(values: WeightFormValues): RecordWeightRequest {
  return { weightKg: typed(values.weightKg) as number, measuredOn: values.measuredOn };
}

/** The shared schema's words, then the same day rule the server applies (not after today, not before birth). */
export function weightFormErrors(values: WeightFormValues, dateOfBirth: string, today: string): Errors<WeightFormValues> {
  const errors = schemaErrors<WeightFormValues>(recordWeightSchema, weightRequest(values));
  if (!errors.measuredOn) {
    const problem = weightDateProblem(values.measuredOn, dateOfBirth, today);
    if (problem) errors.measuredOn = problem;
  }
  return errors;
}
