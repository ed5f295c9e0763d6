import {
  DOSE_UNITS,
  equianalgesicAmountProblem,
  updateEquianalgesicFactorSchema,
  type DoseUnit,
  type EquianalgesicFactor,
} from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';

export interface FactorFormValues {
  amount: NumberFieldValue;
  unit: DoseUnit;
  source: string;
  password: string;
}

/** The row a pharmacist changes, or sets for a drug that has none (no amount or source yet). */
export type FactorTarget = Pick<EquianalgesicFactor, 'drugId' | 'genericName' | 'route' | 'unit'> &
  Partial<Pick<EquianalgesicFactor, 'amount' | 'source'>>;

export function factorFormValues(target: FactorTarget): FactorFormValues {
  return { amount: target.amount ?? '', unit: target.unit, source: target.source ?? '', password: '' };
}

/**
 * The errors the server would give, beside each field before anything is sent: the shared request
 * schema's words, then the same plausibility bound the server applies (shared equianalgesicAmountProblem).
 */
export function factorFormErrors(values: FactorFormValues): Partial<Record<keyof FactorFormValues, string>> {
  const errors: Partial<Record<keyof FactorFormValues, string>> = {};
  const amount = readNumber(values.amount);
  const parsed = updateEquianalgesicFactorSchema.safeParse({
    amount: amount === null ? undefined : (amount ?? Number.NaN),
    unit: values.unit,
    source: values.source,
    signature: { password: values.password || 'x' },
  });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = String(issue.path[0]) as keyof FactorFormValues;
      errors[field] ??= issue.message;
    }
  }
  if (amount === undefined) errors.amount = 'Amount must be a number';
  if (!errors.amount && typeof amount === 'number' && (DOSE_UNITS as readonly string[]).includes(values.unit)) {
    const problem = equianalgesicAmountProblem(amount, values.unit, false);
    if (problem) errors.amount = problem;
  }
  if (!values.password) errors.password = 'Enter your password to sign';
  return errors;
}
