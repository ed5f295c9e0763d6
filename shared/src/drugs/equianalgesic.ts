import { z } from 'zod';
import { answer } from '../api/response-registry.js';
import { atLeast, atMost, must } from '../api/request-rules.js';
import { REFERENCE_PARENTERAL_MORPHINE_MG, type OralMorphineConversion } from '../dose/oral-morphine-equivalent.js';
import { convertDoseUnit } from '../dose/units.js';
import { signatureSchema } from '../orders/order.schema.js';
import { DOSE_UNITS, type DoseUnit } from './drug.schema.js';

/**
 * Pharmacy's equianalgesic table: one row per formulary drug (by id) and route. A `parenteral` row
 * says how much of the drug, given parenterally, is taken as equal to 10 mg parenteral morphine;
 * the one `oral` row (on morphine) says how much oral morphine is. The oral-morphine figure of a
 * PCA is computed from its drug's parenteral row and the oral row, by `conversionFor`.
 */
export const EQUIANALGESIC_ROUTES = ['parenteral', 'oral'] as const;
export const equianalgesicRouteSchema = z.enum(EQUIANALGESIC_ROUTES);
export type EquianalgesicRoute = z.infer<typeof equianalgesicRouteSchema>;

/** Shown instead of a figure when the order's drug has no row (never 0). */
export const NO_CONVERSION_FACTOR = 'No conversion factor set by pharmacy';

// The shipped defaults. NCI PDQ Cancer Pain (health professional version), approximate
// equianalgesic table, National Cancer Institute (versions 2008 and 2014): parenteral morphine
// 10 mg ≈ oral morphine 30 mg; parenteral hydromorphone 2 mg ≈ parenteral morphine 10 mg;
// parenteral fentanyl 100 mcg ≈ parenteral morphine 10 mg. Published tables vary (American Family
// Physician 2000;61(3):755 gives hydromorphone 1.5 mg), so pharmacy may change any of them.
export const NCI_PDQ_EQUIANALGESIC_SOURCE =
  'NCI PDQ Cancer Pain (health professional version), approximate equianalgesic table, National Cancer Institute, 2008 and 2014';
export const REFERENCE_SOURCE = 'Definition: the reference every factor is measured against';

export type DefaultEquianalgesicFactor = { genericName: string; route: EquianalgesicRoute; amount: number; unit: DoseUnit; source: string };

/**
 * Written once, when the table is created (migration) or the demo formulary is written (seed): the
 * formulary rows are found by these generic names then, and every later read is by drug id.
 */
export const DEFAULT_EQUIANALGESIC_FACTORS: readonly DefaultEquianalgesicFactor[] = [
  { genericName: 'morphine', route: 'parenteral', amount: REFERENCE_PARENTERAL_MORPHINE_MG, unit: 'mg', source: REFERENCE_SOURCE },
  { genericName: 'morphine', route: 'oral', amount: 30, unit: 'mg', source: NCI_PDQ_EQUIANALGESIC_SOURCE },
  { genericName: 'hydromorphone', route: 'parenteral', amount: 2, unit: 'mg', source: NCI_PDQ_EQUIANALGESIC_SOURCE },
  { genericName: 'fentanyl', route: 'parenteral', amount: 100, unit: 'mcg', source: NCI_PDQ_EQUIANALGESIC_SOURCE },
];

// A plausibility bound, Lockstep's own and not a clinical value: an equivalent of 10 mg parenteral
// morphine below 1 mcg or above 1,000 mg is a typing error for any opioid used by PCA.
export const EQUIANALGESIC_MIN_MG = 0.001;
export const EQUIANALGESIC_MAX_MG = 1000;
/** The request's own upper bound, in the unit sent (the mg bound above is checked after conversion). */
export const EQUIANALGESIC_MAX_AMOUNT = 1_000_000;
export const EQUIANALGESIC_SOURCE_MAX_LENGTH = 500;

export const equianalgesicFactorSchema = answer(
  'EquianalgesicFactor',
  z.object({
    drugId: z.number().int(),
    genericName: z.string(),
    route: equianalgesicRouteSchema,
    amount: z.number(),
    unit: z.enum(DOSE_UNITS),
    source: z.string(),
    /** Who last changed it; null for the shipped default. */
    changedByName: z.string().nullable(),
    changedAt: z.string(),
  }),
);
export type EquianalgesicFactor = z.infer<typeof equianalgesicFactorSchema>;

/** A pharmacist's change to one row, signed with their password. */
export const updateEquianalgesicFactorSchema = z.strictObject({
  amount: z
    .number(must('Enter the amount', 'Amount must be a number'))
    .positive('Amount must be more than 0')
    .max(EQUIANALGESIC_MAX_AMOUNT, 'Amount is at most 1,000,000'),
  unit: z.enum(DOSE_UNITS, must('Choose the unit', 'Unit must be mg or mcg')),
  source: z
    .string(must('Name the source of this factor', 'Source must be text'))
    .trim()
    .refine(atLeast(1), 'Name the source of this factor')
    .refine(atMost(EQUIANALGESIC_SOURCE_MAX_LENGTH), 'Source is at most 500 characters'),
  signature: signatureSchema,
});
export type UpdateEquianalgesicFactorRequest = z.infer<typeof updateEquianalgesicFactorSchema>;

type FactorKey = Pick<EquianalgesicFactor, 'drugId' | 'route' | 'amount' | 'unit'>;

/** The drug whose oral row the table holds (morphine): its parenteral 10 mg is the reference. */
export function referenceDrugId(factors: readonly Pick<EquianalgesicFactor, 'drugId' | 'route'>[]): number | null {
  return factors.find((factor) => factor.route === 'oral')?.drugId ?? null;
}

/**
 * What is wrong with `amount unit` for a row, or null: outside 1 mcg to 1,000 mg once in mg, or the
 * reference row (parenteral morphine) set to anything but 10 mg.
 */
export function equianalgesicAmountProblem(amount: number, unit: DoseUnit, isReference: boolean): string | null {
  if (!Number.isFinite(amount) || amount <= 0) return 'Amount must be more than 0';
  const mg = convertDoseUnit(amount, unit, 'mg');
  if (isReference && mg !== REFERENCE_PARENTERAL_MORPHINE_MG) {
    return 'Parenteral morphine 10 mg is the reference every factor is measured against: it cannot change';
  }
  if (mg < EQUIANALGESIC_MIN_MG) return 'At least 1 mcg: check the amount';
  if (mg > EQUIANALGESIC_MAX_MG) return 'At most 1,000 mg: check the amount';
  return null;
}

/**
 * The conversion for a drug from pharmacy's table, with the two rows it uses, or null when either
 * row is missing (then no figure is shown, with NO_CONVERSION_FACTOR). Matched by drug id only.
 */
export function conversionFor<T extends FactorKey>(
  drugId: number,
  factors: readonly T[],
): { conversion: OralMorphineConversion; parenteral: T; oral: T } | null {
  const parenteral = factors.find((factor) => factor.drugId === drugId && factor.route === 'parenteral');
  const oral = factors.find((factor) => factor.route === 'oral');
  if (!parenteral || !oral) return null;
  return {
    conversion: {
      parenteralAmount: parenteral.amount,
      parenteralUnit: parenteral.unit,
      oralMorphineMg: convertDoseUnit(oral.amount, oral.unit, 'mg'),
    },
    parenteral,
    oral,
  };
}
