import { REGIMEN_FIELDS, type OrderSummary, type RegimenField } from '@lockstep/shared';

/** What a revision can change, in the order the screens list it. */
export type DiffField = 'drug' | 'concentrationPerMl' | RegimenField | 'indication' | 'reviewDate';

export const DIFF_FIELDS: readonly DiffField[] = ['drug', 'concentrationPerMl', ...REGIMEN_FIELDS, 'indication', 'reviewDate'];

type Comparable = Pick<OrderSummary, 'drugId' | 'concentrationPerMl' | RegimenField | 'indication' | 'reviewDate'>;

// Decimals from two saves of the same number can differ in the last bit.
const SAME_NUMBER = 1e-9;

function sameAmount(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.abs(a - b) < SAME_NUMBER;
}

function differs(field: DiffField, previous: Comparable, current: Comparable): boolean {
  switch (field) {
    case 'drug':
      return previous.drugId !== current.drugId;
    case 'indication':
      return previous.indication.trim() !== current.indication.trim();
    case 'reviewDate':
      return previous.reviewDate !== current.reviewDate;
    default:
      return !sameAmount(previous[field], current[field]);
  }
}

/** The fields whose values differ between an order's previous version and this one. */
export function changedFields(previous: Comparable, current: Comparable): Set<DiffField> {
  return new Set(DIFF_FIELDS.filter((field) => differs(field, previous, current)));
}
