import type { DoseUnit } from '../drugs/drug.schema.js';
import { UCUM_CODES, type DisplayUnit } from '../dose/units.js';
import type { FhirQuantity, FhirRatio } from './fhir-types.js';
import { UCUM_SYSTEM } from './fhir-systems.js';

/**
 * A Quantity with its unit twice, as FHIR R4 Quantity has it: `unit` for people, in Lockstep's
 * safe spelling ("mcg"), and `code` in UCUM for machines ("ug": "mcg" is not a UCUM code).
 */
export function ucumQuantity(value: number, unit: DisplayUnit): FhirQuantity {
  return { value, unit, system: UCUM_SYSTEM, code: UCUM_CODES[unit] };
}

export function doseQuantity(amount: number, doseUnit: DoseUnit): FhirQuantity {
  return ucumQuantity(amount, doseUnit);
}

export function hourlyRateQuantity(amountPerHour: number, doseUnit: DoseUnit): FhirQuantity {
  return ucumQuantity(amountPerHour, `${doseUnit}/h`);
}

/** At most `amount` in any `hours` hours: R4 Dosage.maxDosePerPeriod is a Ratio of dose to time. */
export function dosePerHours(amount: number, doseUnit: DoseUnit, hours: number): FhirRatio {
  return { numerator: doseQuantity(amount, doseUnit), denominator: ucumQuantity(hours, 'h') };
}

/** Concentration as R4 Medication.ingredient.strength: dose per 1 mL. */
export function concentrationRatio(perMl: number, doseUnit: DoseUnit): FhirRatio {
  return { numerator: doseQuantity(perMl, doseUnit), denominator: ucumQuantity(1, 'mL') };
}

export function minutesDuration(minutes: number): FhirQuantity {
  return ucumQuantity(minutes, 'min');
}
