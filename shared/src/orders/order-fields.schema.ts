import { z } from 'zod';
import { atMost, isWhole, must } from '../api/request-rules.js';
import { DOSE_UNITS } from '../drugs/drug.schema.js';
import type { Finding } from '../dose/types.js';
import type { LimitRuleResponse } from '../library/library.schema.js';

const numeric = (required: string, wrongType: string) => z.number(must(required, wrongType));
/** Left out or null for none; a number otherwise. */
const optionalAmount = (label: string) =>
  z
    .number(must(`${label} must be a number`))
    .min(0, `${label} cannot be negative`)
    .nullish();
const id = (required: string, name: string) =>
  z
    .number(must(required, `${name} must be a whole number`))
    .refine(isWhole, `${name} must be a whole number`)
    .positive(`${name} must be positive`);

/** The regimen fields of an order (docs/design.md, "Order fields and dosing conventions"), as a prescriber enters them. */
export const orderFieldsSchema = z.strictObject({
  patientId: id('Choose the patient', 'patientId'),
  drugId: id('Choose the drug', 'drugId'),
  concentrationPerMl: numeric('Enter the concentration', 'Concentration must be a number').positive('Concentration must be more than 0'),
  doseUnit: z.enum(DOSE_UNITS, must('Choose the dose unit', 'Dose unit must be mg or mcg')),
  loadingDose: optionalAmount('Loading dose'),
  demandDose: numeric('Enter the demand dose', 'Demand dose must be a number').min(0, 'Demand dose cannot be negative'),
  lockoutMinutes: numeric('Enter the lockout in minutes', 'Lockout must be a number of minutes').min(
    1,
    'Lockout must be at least 1 minute',
  ),
  basalRatePerHour: numeric('Enter the basal rate (0 for none)', 'Basal rate must be a number').min(
    0,
    'Basal rate cannot be negative (enter 0 for none)',
  ),
  oneHourLimit: optionalAmount('1-hour limit'),
  fourHourLimit: optionalAmount('4-hour limit'),
  clinicianBolusDose: optionalAmount('Clinician bolus'),
  indication: z.string('Indication must be text').refine(atMost(500), 'Indication is at most 500 characters').nullish(),
});
export type OrderFields = z.infer<typeof orderFieldsSchema>;

export type OrderDerivedValues = {
  demandDoseMl: number;
  basalRateMlPerHour: number;
  maxDemandsPerHour: number;
  maxHourlyDose: number;
  maxFourHourDose: number;
};

export type OrderPreview = {
  derived: OrderDerivedValues;
  findings: Finding[];
  rule: LimitRuleResponse | null;
};
